import type { Demand } from "../demand";
import type { Battery } from "../models/battery";
import type { ElectricMachine } from "../models/electric-machine";
import type { WillansEngine } from "../models/willans-engine";
import {
  S_BATT_CURRENT_A, S_BATT_OCV_V, S_BATT_TERMINAL_W, S_BATTERY_LOSS_W, S_BRAKES_W, S_DRIVELINE_W,
  S_ENGINE_LOSS_W, S_ENGINE_ON, S_ENGINE_POWER_W, S_ENGINE_SPEED_RAD_S, S_ENGINE_TORQUE_NM, S_FUEL_W,
  S_MOTOR_LOSS_W, S_MOTOR_POWER_W, S_MOTOR_TORQUE_NM, S_SOC_NEXT, S_UNMET_W, V_BATTERY_POWER,
  V_CHARGE_CURRENT, V_DISCHARGE_CURRENT, V_ENGINE_SPEED, V_ENGINE_TORQUE, V_MOTOR_SPEED, V_MOTOR_TORQUE,
  V_SOC_HIGH, V_SOC_LOW, violate,
} from "../step-output";

/** Relative slack on limit checks so that a point exactly on a limit is not flagged by rounding. */
const SLACK = 1e-12;

/**
 * Runs the engine at `speed` delivering `shaft_w`. Torque above the full-load value is an
 * infeasible step: the engine gives its full-load torque and the rest is booked as unmet.
 * Fuel cut-off: when `cutOff` (moving) and the shaft power is ≤ 0, no fuel.
 */
export function runEngine(out: Float64Array, e: WillansEngine, speed: number, shaft_w: number, fullLoad_nm: number, cutOff: boolean): void {
  out[S_ENGINE_ON] = 1;
  out[S_ENGINE_SPEED_RAD_S] = speed;
  if (speed > e.max_rad_s * (1 + SLACK)) violate(out, V_ENGINE_SPEED, speed, e.max_rad_s);
  let p = shaft_w;
  const t = p / speed;
  if (t > fullLoad_nm * (1 + SLACK) + SLACK) {
    violate(out, V_ENGINE_TORQUE, t, fullLoad_nm);
    const available = fullLoad_nm * speed;
    out[S_UNMET_W] += p - available;
    p = available;
  }
  if (cutOff && p <= 0) {
    out[S_ENGINE_POWER_W] = 0;
    out[S_ENGINE_TORQUE_NM] = 0;
    return;
  }
  const fuel = e.fuelPower_w(p, speed);
  out[S_FUEL_W] += fuel;
  out[S_ENGINE_LOSS_W] += fuel - p;
  out[S_ENGINE_POWER_W] = p;
  out[S_ENGINE_TORQUE_NM] = p / speed;
}

/**
 * Motor delivering mechanical traction power `p_w` at shaft speed `speed` (> 0). Torque
 * above the limit is infeasible: clamped, the rest booked as unmet. Returns electrical power.
 */
export function motorDrive(out: Float64Array, m: ElectricMachine, speed: number, p_w: number, limit_nm: number): number {
  if (speed > m.max_rad_s * (1 + SLACK)) violate(out, V_MOTOR_SPEED, speed, m.max_rad_s);
  let p = p_w;
  const t = p / speed;
  if (t > limit_nm * (1 + SLACK)) {
    violate(out, V_MOTOR_TORQUE, t, limit_nm);
    const available = limit_nm * speed;
    out[S_UNMET_W] += p - available;
    p = available;
  }
  return motorAt(out, m, speed, p);
}

/** Books a motor operating point (mechanical power p, + motoring) and returns its electrical power. */
export function motorAt(out: Float64Array, m: ElectricMachine, speed: number, p_w: number): number {
  const elec = m.electrical_w(p_w);
  out[S_MOTOR_POWER_W] = p_w;
  out[S_MOTOR_TORQUE_NM] = speed > 0 ? p_w / speed : 0;
  out[S_MOTOR_LOSS_W] += elec - p_w;
  return elec;
}

/** Driveline traction at step k: books the driveline loss of carrying P_w/η. */
export function bookTractionDriveline(out: Float64Array, d: Demand, k: number): void {
  out[S_DRIVELINE_W] += d.shaft_w[k] - d.wheel_w[k];
}

/**
 * Braking at step k with `shaft_w` ≤ 0 absorbed at the driveline input: the driveline
 * passes shaft_w/η from the wheels, the friction brakes take the rest of P_w (< 0).
 */
export function bookBraking(out: Float64Array, d: Demand, k: number, shaft_w: number): void {
  if (shaft_w === d.shaft_w[k]) {
    // Everything passes through: no friction braking, not even a rounding residue.
    out[S_DRIVELINE_W] += shaft_w - d.wheel_w[k];
    return;
  }
  const wheelSide = shaft_w / d.driveline_efficiency;
  out[S_BRAKES_W] += wheelSide - d.wheel_w[k];
  out[S_DRIVELINE_W] += shaft_w - wheelSide;
}

/**
 * Regeneration while braking (DESIGN §4): the motor takes as much braking power as its
 * torque limit, its speed range and the battery's charge limit allow, with `busOther_w`
 * (auxiliaries, minus generator output) already on the bus. Returns the motor's electrical
 * power (≤ 0).
 */
export function regenerate(out: Float64Array, d: Demand, k: number, m: ElectricMachine, limit_nm: number, b: Battery, soc: number, busOther_w: number): number {
  const speed = d.shaft_rad_s[k];
  let p = d.shaft_w[k]; // ≤ 0: all the braking power the driveline could pass
  // Geared to the shaft, the motor spins above its maximum while braking too: reported
  // (DESIGN §4), and it does not regenerate there (the friction brakes take everything).
  if (speed > m.max_rad_s * (1 + SLACK)) violate(out, V_MOTOR_SPEED, speed, m.max_rad_s);
  if (speed > m.max_rad_s) p = 0;
  const byTorque = -limit_nm * speed;
  if (p < byTorque) p = byTorque;
  const byBattery = (b.chargeLimit_w(soc, d.dt_s) - busOther_w) / m.efficiency;
  if (byBattery >= 0) p = 0;
  else if (p < byBattery) p = byBattery;
  bookBraking(out, d, k, p);
  return motorAt(out, m, speed, p);
}

/**
 * Battery at terminal power `bus_w` from `soc`. Above U²/(4R) the step is infeasible and
 * the pack gives U²/(4R) (the rest unmet). Current and SOC limits are checked, not clamped:
 * evaluating a fixed control that breaks them is an infeasible step (DESIGN §4).
 */
export function finishBattery(out: Float64Array, b: Battery, soc: number, bus_w: number, dt_s: number): void {
  const u = b.ocv_v(soc);
  let p = bus_w;
  const pMax = b.maxPower_w(u);
  if (p > pMax) {
    violate(out, V_BATTERY_POWER, p, pMax);
    out[S_UNMET_W] += p - pMax;
    p = pMax;
  }
  const i = b.current_a(u, p);
  const next = soc - (i * dt_s) / b.capacity_c;
  out[S_BATT_TERMINAL_W] = p;
  out[S_BATT_CURRENT_A] = i;
  out[S_BATT_OCV_V] = u;
  out[S_BATTERY_LOSS_W] = u * i - p;
  out[S_SOC_NEXT] = next;
  if (i > b.maxDischarge_a * (1 + SLACK)) violate(out, V_DISCHARGE_CURRENT, i, b.maxDischarge_a);
  else if (-i > b.maxCharge_a * (1 + SLACK)) violate(out, V_CHARGE_CURRENT, -i, b.maxCharge_a);
  if (i > 0 && next < b.socMin - SLACK) violate(out, V_SOC_LOW, next, b.socMin);
  else if (i < 0 && next > b.socMax + SLACK) violate(out, V_SOC_HIGH, next, b.socMax);
}

/** No battery (conventional): SOC is carried through unchanged. */
export function noBattery(out: Float64Array, soc: number): void {
  out[S_SOC_NEXT] = soc;
}
