import { buildCustomCycle, cycleStats, type CycleStats } from "@/lib/engine/cycles";

/**
 * The car the traction coefficients of an upload preview refer to: REFERENCES.md's worked
 * example (1500 kg, c_r 0.012, Cd·A 0.66 m², ρ 1.225 kg/m³, g 9.80665 m/s²). Duration,
 * distance, speeds and shares do not depend on it.
 */
export const REFERENCE_CAR = {
  inertial_mass_kg: 1500, mass_kg: 1500, drag_area_m2: 0.66, air_density_kg_m3: 1.225, rolling_resistance: 0.012, gravity_m_s2: 9.80665,
} as const;

/** Cycle statistics of lib/engine for an uploaded cycle. */
export function referenceStats(dt_s: number, speed_kmh: readonly number[], grade_pct?: readonly number[]): CycleStats {
  return cycleStats(buildCustomCycle(dt_s, speed_kmh, grade_pct), REFERENCE_CAR);
}
