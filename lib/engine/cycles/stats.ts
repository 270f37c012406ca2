import type { Cycle } from "./cycle";
import { msToKmh } from "../units";

/** Vehicle figures that decide which intervals need positive traction. */
export interface TractionVehicle {
  inertial_mass_kg: number;
  mass_kg: number;
  drag_area_m2: number;
  air_density_kg_m3: number;
  rolling_resistance: number;
  gravity_m_s2: number;
}

export interface CycleStats {
  duration_s: number;
  distance_m: number;
  distance_km: number;
  mean_speed_kmh: number;
  max_speed_kmh: number;
  mean_positive_accel_m_s2: number;
  stops: number;
  idle_share: number;
  accel_share: number;
  cruise_share: number;
  decel_share: number;
  /**
   * Positive-traction coefficients: over the intervals where the level-road traction force
   * ρ/2·CdA·v̄² + m·g·c_r + m_i·a is positive, x_aero = Σ ∫v³dt / D (exact for the linear
   * ramp between samples, so the figure does not depend on dt), x_roll = Σ v̄·dt / D,
   * x_m = Σ a·v̄·dt / D (D = cycle distance), so that the positive traction energy is
   * ρ/2·CdA·x_aero·D + m·g·c_r·x_roll·D + m_i·x_m·D. Units m²/s², 1, m/s².
   */
  x_aero_m2_s2: number;
  x_roll: number;
  x_m_m_s2: number;
}

/** |a| below this counts as constant speed (m/s²); the rebuilt cycles have exact zeros. */
const CRUISE_TOLERANCE_M_S2 = 1e-9;

export function cycleStats(cycle: Cycle, car: TractionVehicle): CycleStats {
  const v = cycle.speed_m_s;
  const dt = cycle.dt_s;
  const n = v.length - 1;
  let distance = 0, vmax = v[0], accSum = 0, accCount = 0, stops = 0;
  let idle = 0, acc = 0, cruise = 0, dec = 0;
  let sAero = 0, sRoll = 0, sM = 0;
  let wasMoving = false;
  const half = 0.5 * car.air_density_kg_m3 * car.drag_area_m2;
  const rollForce = car.mass_kg * car.gravity_m_s2 * car.rolling_resistance;
  for (let k = 0; k < n; k++) {
    const vbar = 0.5 * (v[k] + v[k + 1]);
    const a = (v[k + 1] - v[k]) / dt;
    if (v[k + 1] > vmax) vmax = v[k + 1];
    distance += vbar * dt;
    const moving = vbar > 0;
    if (!moving) {
      idle++;
      if (wasMoving) stops++;
    } else if (a > CRUISE_TOLERANCE_M_S2) {
      acc++;
      accSum += a;
      accCount++;
    } else if (a < -CRUISE_TOLERANCE_M_S2) dec++;
    else cruise++;
    wasMoving = moving;
    if (moving && half * vbar * vbar + rollForce + car.inertial_mass_kg * a > 0) {
      // exact ∫v³dt of the linear ramp v[k]→v[k+1]; v̄³·dt would under-count by a·dt²-terms
      sAero += 0.25 * dt * (v[k] + v[k + 1]) * (v[k] * v[k] + v[k + 1] * v[k + 1]);
      sRoll += vbar * dt;
      sM += a * vbar * dt;
    }
  }
  const duration = n * dt;
  const perD = distance > 0 ? 1 / distance : 0;
  return {
    duration_s: duration,
    distance_m: distance,
    distance_km: distance / 1000,
    mean_speed_kmh: duration > 0 ? msToKmh(distance / duration) : 0,
    max_speed_kmh: msToKmh(vmax),
    mean_positive_accel_m_s2: accCount > 0 ? accSum / accCount : 0,
    stops,
    idle_share: n > 0 ? idle / n : 0,
    accel_share: n > 0 ? acc / n : 0,
    cruise_share: n > 0 ? cruise / n : 0,
    decel_share: n > 0 ? dec / n : 0,
    x_aero_m2_s2: sAero * perD,
    x_roll: sRoll * perD,
    x_m_m_s2: sM * perD,
  };
}
