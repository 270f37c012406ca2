import type { Battery } from "../../models/battery";

/** Relative slack on limit checks, the same as plants/common.ts, so both agree on eligibility. */
const SLACK = 1e-12;

/**
 * The battery part of one step as a scalar function (DESIGN §4, identical arithmetic to
 * plants/common.ts `finishBattery`): current for terminal power P at OCV U, and whether the
 * move respects P_max, the current limits and the SOC window. Kept separate from the plant
 * so that DP and ECMS can score a candidate at any SOC without re-running the whole step.
 */
export class BatteryStep {
  readonly r4: number;
  /** SOC change per ampere over one step: dt / Q. */
  readonly socPerAmp: number;
  readonly maxDischarge_a: number;
  readonly maxCharge_a: number;
  readonly socMin: number;
  readonly socMax: number;

  constructor(readonly battery: Battery, readonly dt_s: number) {
    this.r4 = 4 * battery.resistance_ohm;
    this.socPerAmp = dt_s / battery.capacity_c;
    this.maxDischarge_a = battery.maxDischarge_a * (1 + SLACK);
    this.maxCharge_a = battery.maxCharge_a * (1 + SLACK);
    this.socMin = battery.socMin - SLACK;
    this.socMax = battery.socMax + SLACK;
  }

  /**
   * Current (A, + discharge) for terminal power p_w at OCV u_v, or Infinity when the move
   * breaks P_max or a current limit. pMax_w = U²/(4R) at the same OCV.
   */
  current_a(u_v: number, pMax_w: number, p_w: number): number {
    if (p_w > pMax_w) return Infinity;
    const disc = u_v * u_v - this.r4 * p_w;
    const i = (2 * p_w) / (u_v + Math.sqrt(disc > 0 ? disc : 0));
    if (i > this.maxDischarge_a || -i > this.maxCharge_a) return Infinity;
    return i;
  }

  /** SOC after the step with current i from soc, or -1 when it leaves the window (the SOC-limit rule of finishBattery). */
  next(soc: number, i: number): number {
    const s1 = soc - i * this.socPerAmp;
    if (i > 0 ? s1 < this.socMin : i < 0 && s1 > this.socMax) return -1;
    return s1;
  }

  /** Bus power of a braking step at this SOC (regeneration curtailed by the charge limit). */
  static brakingBus(busFull_w: number, busOther_w: number, chargeLimit_w: number): number {
    const curtailed = chargeLimit_w < busOther_w ? chargeLimit_w : busOther_w;
    return busFull_w > curtailed ? busFull_w : curtailed;
  }
}
