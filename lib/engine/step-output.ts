/**
 * Layout of the scratch Float64Array a plant writes for one step (see docs/engine.md).
 * Powers in W, speeds in rad/s, torques in N·m. Loss slots are ≥ 0 and computed from the
 * same quantities as the energy flow, so each step's ledger closes by construction:
 *   FUEL + U_oc·I + UNMET = P_wheel + BRAKES + DRIVELINE + CLUTCH + ENGINE_LOSS + MOTOR_LOSS
 *                           + GENERATOR_LOSS + BATTERY_LOSS + AUX
 */
export const S_FUEL_W = 0;
export const S_BATT_TERMINAL_W = 1;
export const S_BATT_CURRENT_A = 2;
export const S_BATT_OCV_V = 3;
export const S_SOC_NEXT = 4;
export const S_BRAKES_W = 5;
export const S_DRIVELINE_W = 6;
export const S_CLUTCH_W = 7;
export const S_ENGINE_LOSS_W = 8;
export const S_MOTOR_LOSS_W = 9;
export const S_GENERATOR_LOSS_W = 10;
export const S_BATTERY_LOSS_W = 11;
export const S_AUX_W = 12;
/** Demand the plant could not supply on an infeasible step (clamped to what is available). */
export const S_UNMET_W = 13;
export const S_ENGINE_ON = 14;
export const S_ENGINE_POWER_W = 15;
export const S_ENGINE_SPEED_RAD_S = 16;
export const S_ENGINE_TORQUE_NM = 17;
export const S_MOTOR_POWER_W = 18; // mechanical, + motoring
export const S_MOTOR_TORQUE_NM = 19;
export const S_GENERATOR_POWER_W = 20; // electrical output
/** Bit mask of violated limits (bit v = Violation v); 0 means the control is eligible. */
export const S_VIOLATIONS = 21;
/** Slots cleared at the start of every step. */
export const S_CLEARED = 22;
/** For violation v: demanded value at S_DEMANDED + 2v, available at S_DEMANDED + 2v + 1. */
export const S_DEMANDED = 22;

/** Violation kinds (bit positions); units of demanded/available in VIOLATION_INFO. */
export const V_ENGINE_TORQUE = 0;
export const V_ENGINE_SPEED = 1;
export const V_MOTOR_TORQUE = 2;
export const V_MOTOR_SPEED = 3;
export const V_GENERATOR_POWER = 4;
export const V_BATTERY_POWER = 5;
export const V_DISCHARGE_CURRENT = 6;
export const V_CHARGE_CURRENT = 7;
export const V_SOC_LOW = 8;
export const V_SOC_HIGH = 9;
export const VIOLATION_COUNT = 10;

export const STEP_SLOTS = S_DEMANDED + 2 * VIOLATION_COUNT;

export interface ViolationInfo {
  code: string;
  component: "engine" | "motor" | "generator" | "battery";
  what: string;
  unit: string;
  /** Factor from the SI value stored in the slot to the reported unit. */
  scale: number;
}

export const VIOLATION_INFO: readonly ViolationInfo[] = [
  { code: "engine_torque_above_full_load", component: "engine", what: "engine torque above the full-load curve", unit: "N·m", scale: 1 },
  { code: "engine_speed_above_max", component: "engine", what: "engine speed above its maximum", unit: "rpm", scale: 30 / Math.PI },
  { code: "motor_torque_above_limit", component: "motor", what: "motor torque above min(T_peak, P_peak/ω)", unit: "N·m", scale: 1 },
  { code: "motor_speed_above_max", component: "motor", what: "motor speed above its maximum", unit: "rpm", scale: 30 / Math.PI },
  { code: "generator_power_above_limit", component: "generator", what: "generator power request above what the generator or engine can give", unit: "kW", scale: 1e-3 },
  { code: "battery_power_above_max", component: "battery", what: "battery power above U_oc²/(4R)", unit: "kW", scale: 1e-3 },
  { code: "battery_discharge_current_above_limit", component: "battery", what: "discharge current above max_discharge_c", unit: "A", scale: 1 },
  { code: "battery_charge_current_above_limit", component: "battery", what: "charge current above max_charge_c", unit: "A", scale: 1 },
  { code: "soc_below_min", component: "battery", what: "SOC below soc_min", unit: "", scale: 1 },
  { code: "soc_above_max", component: "battery", what: "SOC above soc_max", unit: "", scale: 1 },
];

export function newStepScratch(): Float64Array {
  return new Float64Array(STEP_SLOTS);
}

export function clearStep(out: Float64Array): void {
  for (let i = 0; i < S_CLEARED; i++) out[i] = 0;
}

/** Records a violated limit; keeps the worst (largest excess) if set twice in a step. */
export function violate(out: Float64Array, v: number, demanded: number, available: number): void {
  const slot = S_DEMANDED + 2 * v;
  const mask = out[S_VIOLATIONS];
  if ((mask & (1 << v)) !== 0 && demanded - available <= out[slot] - out[slot + 1]) return;
  out[S_VIOLATIONS] = mask | (1 << v);
  out[slot] = demanded;
  out[slot + 1] = available;
}
