import type { Plant } from "../../plants/plant";
import type { Battery } from "../../models/battery";
import type { ElectricMachine } from "../../models/electric-machine";
import { S_FUEL_W, S_GENERATOR_POWER_W, S_UNMET_W, S_VIOLATIONS, newStepScratch } from "../../step-output";

/** Violation bits that do not depend on SOC: engine torque/speed, motor torque/speed, generator power. */
export const HARDWARE_BITS = 0b11111;

/**
 * Weight on unmet power on steps where no candidate is free of hardware violations (the
 * cycle asks more than the hardware gives): such a step keeps all candidates and prefers
 * the one that leaves the least demand unmet. 1 W unmet costs as much as 1 kW of fuel
 * (common practice, no source: large enough to dominate any fuel difference).
 */
export const UNMET_WEIGHT = 1000;

/** A plant with a battery and candidate controls: parallel and series hybrids. */
export interface HybridPlant extends Plant {
  readonly battery: Battery;
  readonly motor: ElectricMachine;
}

/**
 * Per (step, candidate) quantities that do not depend on SOC, computed once per cycle with
 * the plant's own exact step model without the battery (plant.drive):
 *   fuel power, battery terminal (bus) power, unmet power, hardware violations.
 * Only eligible candidates are stored, compacted: step k owns slots [start[k], start[k+1]).
 * While braking the bus power depends on SOC through the charge limit (DESIGN §4: the motor
 * regenerates as much as the charge limit allows with the other bus loads counted), so a
 * braking step stores the bus without the motor (`busOther`) and with full regeneration
 * (`bus`); at SOC s the bus is max(bus, min(chargeLimit(s), busOther)), the same rule as
 * plants/common.ts `regenerate`.
 */
export interface CandidateTables {
  n: number;
  dt_s: number;
  controlPoints: number;
  start: Int32Array; // length n + 1
  /** Candidate index j (plant numbering) of each stored slot. */
  index: Uint16Array;
  fuel_w: Float64Array;
  /** Stage cost (J): fuel·dt, plus UNMET_WEIGHT·unmet·dt on hardware-limited steps. */
  stage_j: Float64Array;
  bus_w: Float64Array;
  busOther_w: Float64Array;
  braking: Uint8Array;
  /** Steps where every candidate breaks a hardware limit (their violations are tolerated). */
  hardwareLimited: Uint8Array;
}

/** Motor electrical power when regenerating all the braking power its limits allow (≤ 0). */
function fullRegen_w(plant: HybridPlant, k: number): number {
  const d = plant.demand;
  const m = plant.motor;
  const speed = d.shaft_rad_s[k];
  let p = speed > m.max_rad_s ? 0 : d.shaft_w[k];
  const byTorque = -m.torqueLimit_nm(speed) * speed;
  if (p < byTorque) p = byTorque;
  return m.electrical_w(p);
}

export function buildCandidateTables(plant: HybridPlant, controlPoints: number): CandidateTables {
  const d = plant.demand;
  const n = d.n;
  let cap = 0;
  for (let k = 0; k < n; k++) cap += plant.candidateCount(k, controlPoints);
  const start = new Int32Array(n + 1);
  const index = new Uint16Array(cap);
  const buf = new Float64Array(4 * cap);
  const fuel_w = buf.subarray(0, cap);
  const stage_j = buf.subarray(cap, 2 * cap);
  const bus_w = buf.subarray(2 * cap, 3 * cap);
  const busOther_w = buf.subarray(3 * cap, 4 * cap);
  const braking = new Uint8Array(n);
  const hardwareLimited = new Uint8Array(n);
  const out = newStepScratch();
  const ctl = new Float64Array(2);
  const socRef = plant.battery.socInitial;
  let slot = 0;
  for (let k = 0; k < n; k++) {
    start[k] = slot;
    const count = plant.candidateCount(k, controlPoints);
    const brakes = d.moving[k] !== 0 && !(d.wheel_w[k] > 0);
    braking[k] = brakes ? 1 : 0;
    const regen = brakes ? fullRegen_w(plant, k) : 0;
    let anyClean = false;
    for (let j = 0; j < count; j++) {
      plant.candidate(k, j, controlPoints, ctl);
      plant.drive(k, socRef, ctl[0], ctl[1], out);
      if ((out[S_VIOLATIONS] & HARDWARE_BITS) === 0) { anyClean = true; break; }
    }
    hardwareLimited[k] = anyClean ? 0 : 1;
    for (let j = 0; j < count; j++) {
      plant.candidate(k, j, controlPoints, ctl);
      const bus = plant.drive(k, socRef, ctl[0], ctl[1], out);
      if (anyClean && (out[S_VIOLATIONS] & HARDWARE_BITS) !== 0) continue;
      const unmet = out[S_UNMET_W];
      index[slot] = j;
      fuel_w[slot] = out[S_FUEL_W];
      stage_j[slot] = (out[S_FUEL_W] + (anyClean ? 0 : UNMET_WEIGHT * unmet)) * d.dt_s;
      const other = plant.aux_w - out[S_GENERATOR_POWER_W];
      busOther_w[slot] = other;
      bus_w[slot] = brakes ? other + regen : bus;
      slot++;
    }
  }
  start[n] = slot;
  return { n, dt_s: d.dt_s, controlPoints, start, index, fuel_w, stage_j, bus_w, busOther_w, braking, hardwareLimited };
}
