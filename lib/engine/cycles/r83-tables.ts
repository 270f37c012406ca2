/**
 * Operation lists of the ECE-15 urban and EUDC extra-urban cycles, transcribed from
 * UNECE Regulation No. 83, Annex 4a, Tables 1 and 2 (see shared REFERENCES.md).
 * Each operation runs linearly in time from `from_kmh` to `to_kmh` over `duration_s`;
 * the published accelerations are rounded values of these ramps, so speeds and durations
 * are the data and accelerations follow from them.
 * Operation 22 of ECE-15 ("gear change", 35→32 km/h) is taken as a linear ramp.
 */
export type OperationKind = "idle" | "accel" | "steady" | "decel" | "decel_clutch" | "gear_change";

export interface Operation {
  kind: OperationKind;
  from_kmh: number;
  to_kmh: number;
  duration_s: number;
}

const op = (kind: OperationKind, from_kmh: number, to_kmh: number, duration_s: number): Operation => ({
  kind, from_kmh, to_kmh, duration_s,
});

/** UNECE R83 Annex 4a Table 1 — elementary urban cycle (ECE-15), 195 s. */
export const ECE15_OPERATIONS: readonly Operation[] = [
  op("idle", 0, 0, 11),
  op("accel", 0, 15, 4),
  op("steady", 15, 15, 8),
  op("decel", 15, 10, 2),
  op("decel_clutch", 10, 0, 3),
  op("idle", 0, 0, 21),
  op("accel", 0, 15, 5),
  op("gear_change", 15, 15, 2),
  op("accel", 15, 32, 5),
  op("steady", 32, 32, 24),
  op("decel", 32, 10, 8),
  op("decel_clutch", 10, 0, 3),
  op("idle", 0, 0, 21),
  op("accel", 0, 15, 5),
  op("gear_change", 15, 15, 2),
  op("accel", 15, 35, 9),
  op("gear_change", 35, 35, 2),
  op("accel", 35, 50, 8),
  op("steady", 50, 50, 12),
  op("decel", 50, 35, 8),
  op("steady", 35, 35, 13),
  op("gear_change", 35, 32, 2),
  op("decel", 32, 10, 7),
  op("decel_clutch", 10, 0, 3),
  op("idle", 0, 0, 7),
];

/** UNECE R83 Annex 4a Table 2 — extra-urban cycle (EUDC), 400 s. */
export const EUDC_OPERATIONS: readonly Operation[] = [
  op("idle", 0, 0, 20),
  op("accel", 0, 15, 5),
  op("gear_change", 15, 15, 2),
  op("accel", 15, 35, 9),
  op("gear_change", 35, 35, 2),
  op("accel", 35, 50, 8),
  op("gear_change", 50, 50, 2),
  op("accel", 50, 70, 13),
  op("steady", 70, 70, 50),
  op("decel", 70, 50, 8),
  op("steady", 50, 50, 69),
  op("accel", 50, 70, 13),
  op("steady", 70, 70, 50),
  op("accel", 70, 100, 35),
  op("steady", 100, 100, 30),
  op("accel", 100, 120, 20),
  op("steady", 120, 120, 10),
  op("decel", 120, 80, 16),
  op("decel", 80, 50, 8),
  op("decel_clutch", 50, 0, 10),
  op("idle", 0, 0, 20),
];

/** NEDC = 4 × ECE-15 followed by one EUDC (R83 Annex 4a). */
export const NEDC_OPERATIONS: readonly Operation[] = [
  ...ECE15_OPERATIONS, ...ECE15_OPERATIONS, ...ECE15_OPERATIONS, ...ECE15_OPERATIONS, ...EUDC_OPERATIONS,
];
