/** What the team library holds. */
export const LIBRARY_KINDS = ["cycle", "engine_full_load", "battery_ocv"] as const;
export type LibraryKind = (typeof LIBRARY_KINDS)[number];

export const LIBRARY_KIND_LABELS: Record<LibraryKind, string> = {
  cycle: "Drive cycle",
  engine_full_load: "Engine full-load curve",
  battery_ocv: "Battery OCV curve",
};

/** The blocks that refer to items of each kind (for "change their … first"). */
export const LIBRARY_KIND_BLOCKS: Record<LibraryKind, string> = {
  cycle: "drive-cycle blocks",
  engine_full_load: "engine blocks",
  battery_ocv: "battery pack blocks",
};

/**
 * Largest cycle kept in the library: 200,000 samples (55 h at 1 Hz, 5.5 h at 10 Hz); larger
 * resamplings are refused at save so that one item stays a few MB of JSON (our choice).
 */
export const MAX_LIBRARY_CYCLE_SAMPLES = 200_000;
