/**
 * Published figures of drive cycles an upload can be recognised as (shared REFERENCES.md).
 */

/**
 * WLTC class 3b, UN GTR No. 15, Annex 1: 1 Hz speeds 0..1800 s. Phases by second:
 * Low 0–589, Medium 590–1022, High 1023–1477, Extra-high 1478–1800 (durations
 * 589/433/455/323 s); checksum = sum of the 1 Hz speeds (km/h) within the phase.
 */
export const WLTC_3B = {
  name: "WLTC class 3b",
  duration_s: 1800,
  distance_km: 23.266,
  max_speed_kmh: 131.3,
  phases: [
    { name: "Low", first_s: 0, last_s: 589, checksum_kmh: 11140.3 },
    { name: "Medium", first_s: 590, last_s: 1022, checksum_kmh: 17121.2 },
    { name: "High", first_s: 1023, last_s: 1477, checksum_kmh: 25782.2 },
    { name: "Extra-high", first_s: 1478, last_s: 1800, checksum_kmh: 29714.9 },
  ],
} as const;

/** The checksums are printed to 0.1 km/h; sums of 1-decimal speeds match to rounding noise. */
export const CHECKSUM_TOLERANCE_KMH = 0.05;

/** Summary figures only (duration, distance, max speed) of the US cycles. */
export interface SummaryCycle {
  name: string;
  duration_s: number;
  distance_km: number;
  /** Relative tolerance on distance: the figure is printed to 0.01 mi (≈ 0.1 %) and 1 Hz tables integrate slightly differently. */
  distance_rel_tol: number;
  max_speed_kmh: number;
  /** Published to 0.1 mph. */
  max_speed_tol_kmh: number;
  source: string;
}

const MPH = 1.609344;
export const US_CYCLES: readonly SummaryCycle[] = [
  { name: "UDDS", duration_s: 1369, distance_km: 7.45 * MPH, distance_rel_tol: 0.005, max_speed_kmh: 56.7 * MPH, max_speed_tol_kmh: 0.1 * MPH, source: "40 CFR 86, App. I(a)" },
  { name: "HWFET", duration_s: 765, distance_km: 10.26 * MPH, distance_rel_tol: 0.005, max_speed_kmh: 59.9 * MPH, max_speed_tol_kmh: 0.1 * MPH, source: "40 CFR 600, App. I" },
  { name: "US06", duration_s: 596, distance_km: 8.01 * MPH, distance_rel_tol: 0.005, max_speed_kmh: 80.3 * MPH, max_speed_tol_kmh: 0.1 * MPH, source: "40 CFR 86, App. I(g)" },
];

/** R83 cycles: the upload is compared sample by sample with the rebuild from lib/engine. */
export const R83_CYCLES = [
  { id: "ece15", name: "ECE-15 (UNECE R83)", duration_s: 195, distance_km: 1.013 },
  { id: "eudc", name: "EUDC (UNECE R83)", duration_s: 400, distance_km: 6.955 },
  { id: "nedc", name: "NEDC (UNECE R83)", duration_s: 1180, distance_km: 11.007 },
] as const;

/** Largest sample difference (km/h) from the R83 rebuild still called a match: tables print speeds to 0.1 km/h. */
export const R83_SAMPLE_TOLERANCE_KMH = 0.1;
