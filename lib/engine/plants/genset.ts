import type { WillansEngine } from "../models/willans-engine";
import type { OperatingLine } from "../models/operating-line";
import {
  S_ENGINE_LOSS_W, S_ENGINE_ON, S_ENGINE_POWER_W, S_ENGINE_SPEED_RAD_S, S_ENGINE_TORQUE_NM, S_FUEL_W,
  S_GENERATOR_LOSS_W, S_GENERATOR_POWER_W, V_GENERATOR_POWER, violate,
} from "../step-output";

export interface GensetParams {
  engine: WillansEngine;
  line: OperatingLine;
  peak_w: number;
  efficiency: number;
}

/**
 * Engine–generator set asked for electrical power `request_w` (> 0). It runs on the
 * best-fuel operating line. A request above the generator peak, or above what the engine
 * can give at full load, is a control outside the limits: reported and reduced to the
 * limit (the battery then covers the rest, so nothing is unmet). Returns the electrical
 * power delivered.
 */
export function runGenset(out: Float64Array, g: GensetParams, request_w: number): number {
  let elec = request_w;
  if (elec > g.peak_w) {
    violate(out, V_GENERATOR_POWER, elec, g.peak_w);
    elec = g.peak_w;
  }
  let mech = elec / g.efficiency;
  const maxMech = g.line.maxPower_w;
  if (mech > maxMech) {
    violate(out, V_GENERATOR_POWER, elec, maxMech * g.efficiency);
    mech = maxMech;
    elec = mech * g.efficiency;
  }
  const speed = mech === maxMech ? g.line.maxPowerSpeed_rad_s : g.line.speedFor_rad_s(mech);
  const fuel = g.engine.fuelPower_w(mech, speed);
  out[S_ENGINE_ON] = 1;
  out[S_ENGINE_SPEED_RAD_S] = speed;
  out[S_ENGINE_POWER_W] = mech;
  out[S_ENGINE_TORQUE_NM] = mech / speed;
  out[S_FUEL_W] += fuel;
  out[S_ENGINE_LOSS_W] += fuel - mech;
  out[S_GENERATOR_LOSS_W] += mech - elec;
  out[S_GENERATOR_POWER_W] = elec;
  return elec;
}
