import type { Cycle } from "./cycles/cycle";
import type { Driveline, Vehicle } from "./scenario/schema";
import { roadLoadPowers, type RoadLoadParams, type RoadLoadPowers } from "./models/road-load";
import { scheduledGear } from "./models/gear-schedule";
import { msToKmh } from "./units";
import { f64Views } from "./buffers";

/**
 * Everything about a step that does not depend on the powertrain's control, computed once
 * per cycle into typed arrays (DESIGN §4 discretisation: interval k uses the mean speed
 * v̄ = (v_k + v_{k+1})/2 and a = (v_{k+1} − v_k)/dt).
 */
export interface Demand {
  n: number;
  dt_s: number;
  time_s: Float64Array; // start of interval k
  speed_m_s: Float64Array; // mean speed v̄
  accel_m_s2: Float64Array;
  moving: Uint8Array; // v̄ > 0
  aero_w: Float64Array;
  rolling_w: Float64Array;
  grade_w: Float64Array;
  inertia_w: Float64Array;
  wheel_w: Float64Array;
  gear: Uint8Array; // 0 at standstill, else the scheduled gear (1-based)
  /** Driveline-input (engine/motor shaft) speed ω_w·γ_gear·γ_fd; 0 at standstill. */
  shaft_rad_s: Float64Array;
  /**
   * Driveline-input power: traction P_w/η; braking P_w·η, i.e. the most braking power that
   * can reach the shaft (the friction brakes take whatever the shaft does not absorb).
   */
  shaft_w: Float64Array;
  driveline_efficiency: number;
  distance_m: number;
}

export function roadLoadParams(v: Vehicle): RoadLoadParams {
  return {
    mass_kg: v.mass_kg,
    inertial_mass_kg: v.mass_kg * (1 + v.rotating_mass_factor),
    drag_area_m2: v.drag_coefficient * v.frontal_area_m2,
    air_density_kg_m3: v.air_density_kg_m3,
    rolling_resistance: v.rolling_resistance,
    gravity_m_s2: v.gravity_m_s2,
  };
}

export function computeDemand(cycle: Cycle, vehicle: Vehicle, driveline: Driveline): Demand {
  const v = cycle.speed_m_s;
  const n = v.length - 1;
  const dt = cycle.dt_s;
  const p = roadLoadParams(vehicle);
  const [time_s, speed_m_s, accel_m_s2, aero_w, rolling_w, grade_w, inertia_w, wheel_w, shaft_rad_s, shaft_w] = f64Views(n, 10);
  const bytes = new Uint8Array(2 * n);
  const d: Demand = {
    n, dt_s: dt, time_s, speed_m_s, accel_m_s2, moving: bytes.subarray(0, n), aero_w, rolling_w, grade_w,
    inertia_w, wheel_w, gear: bytes.subarray(n), shaft_rad_s, shaft_w,
    driveline_efficiency: driveline.efficiency, distance_m: 0,
  };
  const rl: RoadLoadPowers = { aero_w: 0, rolling_w: 0, grade_w: 0, inertia_w: 0 };
  const eta = driveline.efficiency;
  const ratios = driveline.gear_ratios;
  const th = driveline.upshift_speeds_kmh;
  const grade = cycle.grade_rad;
  for (let k = 0; k < n; k++) {
    const vbar = 0.5 * (v[k] + v[k + 1]);
    const a = (v[k + 1] - v[k]) / dt;
    d.time_s[k] = k * dt;
    d.speed_m_s[k] = vbar;
    d.accel_m_s2[k] = a;
    d.distance_m += vbar * dt;
    if (!(vbar > 0)) continue;
    d.moving[k] = 1;
    roadLoadPowers(p, vbar, a, grade === null ? 0 : grade[k], rl);
    d.aero_w[k] = rl.aero_w;
    d.rolling_w[k] = rl.rolling_w;
    d.grade_w[k] = rl.grade_w;
    d.inertia_w[k] = rl.inertia_w;
    const pw = rl.aero_w + rl.rolling_w + rl.grade_w + rl.inertia_w;
    d.wheel_w[k] = pw;
    const gear = scheduledGear(msToKmh(vbar), th);
    d.gear[k] = gear;
    d.shaft_rad_s[k] = (vbar / vehicle.wheel_radius_m) * ratios[gear - 1] * driveline.final_drive_ratio;
    d.shaft_w[k] = pw > 0 ? pw / eta : pw * eta;
  }
  return d;
}
