import type { BatterySpec } from "../scenario/schema";
import { S_PER_H } from "../units";

/**
 * Open-circuit voltage + internal resistance pack (DESIGN §4). For terminal power P
 * (positive = discharge) I = (U − √(U² − 4RP)) / (2R), written as 2P / (U + √(U² − 4RP))
 * so that small powers keep full precision and R = 0 works. U is the OCV at the SOC at
 * the start of the step. P above U²/(4R) has no real solution.
 */
export class Battery {
  readonly ocvSoc: Float64Array;
  readonly ocvVoltage: Float64Array;
  readonly resistance_ohm: number;
  readonly capacity_c: number; // coulombs
  readonly capacity_ah: number;
  readonly maxDischarge_a: number;
  readonly maxCharge_a: number;
  readonly socMin: number;
  readonly socMax: number;
  readonly socInitial: number;

  constructor(spec: BatterySpec) {
    this.ocvSoc = Float64Array.from(spec.ocv.soc);
    this.ocvVoltage = Float64Array.from(spec.ocv.voltage_v);
    this.resistance_ohm = spec.resistance_ohm;
    this.capacity_ah = spec.capacity_ah;
    this.capacity_c = spec.capacity_ah * S_PER_H;
    this.maxDischarge_a = spec.max_discharge_c * spec.capacity_ah;
    this.maxCharge_a = spec.max_charge_c * spec.capacity_ah;
    this.socMin = spec.soc_min;
    this.socMax = spec.soc_max;
    this.socInitial = spec.soc_initial;
  }

  /** Piecewise-linear OCV; end values hold outside the table. */
  ocv_v(soc: number): number {
    const x = this.ocvSoc;
    const y = this.ocvVoltage;
    const last = x.length - 1;
    if (soc <= x[0]) return y[0];
    if (soc >= x[last]) return y[last];
    let i = 1;
    while (x[i] < soc) i++;
    return y[i - 1] + ((soc - x[i - 1]) / (x[i] - x[i - 1])) * (y[i] - y[i - 1]);
  }

  /** U²/(4R): the most terminal power the pack can deliver at OCV u. */
  maxPower_w(u_v: number): number {
    return this.resistance_ohm > 0 ? (u_v * u_v) / (4 * this.resistance_ohm) : Infinity;
  }

  /** Current for terminal power p at OCV u; the caller keeps p ≤ maxPower_w(u). */
  current_a(u_v: number, p_w: number): number {
    const disc = u_v * u_v - 4 * this.resistance_ohm * p_w;
    return (2 * p_w) / (u_v + Math.sqrt(disc > 0 ? disc : 0));
  }

  terminalPower_w(u_v: number, i_a: number): number {
    return u_v * i_a - this.resistance_ohm * i_a * i_a;
  }

  /** Largest discharge power that respects the current limit, P_max and soc_min within the step. */
  dischargeLimit_w(soc: number, dt_s: number): number {
    const u = this.ocv_v(soc);
    const bySoc = ((soc - this.socMin) * this.capacity_c) / dt_s;
    const atPeak = this.resistance_ohm > 0 ? u / (2 * this.resistance_ohm) : Infinity;
    const i = Math.min(this.maxDischarge_a, bySoc, atPeak);
    return i > 0 ? this.terminalPower_w(u, i) : 0;
  }

  /** Most negative terminal power (charge) that respects the charge-current limit and soc_max within the step. */
  chargeLimit_w(soc: number, dt_s: number): number {
    const u = this.ocv_v(soc);
    const bySoc = ((this.socMax - soc) * this.capacity_c) / dt_s;
    const i = Math.min(this.maxCharge_a, bySoc);
    return i > 0 ? this.terminalPower_w(u, -i) : 0;
  }
}
