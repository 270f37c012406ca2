import type { CandidateTables } from "./tables";
import { BatteryStep } from "./battery-step";
import { EDGE_TOL, interpolate, type CostToGo } from "./cost-to-go";

/** Outcome of scoring every candidate of one step at one exact SOC. */
export interface StageEval {
  /** Smallest stage cost + cost-to-go (J), Infinity when no candidate reaches a feasible SOC. */
  cost: number;
  /** Table slot of that candidate, -1 if none. */
  slot: number;
  /** Highest / lowest next SOC over candidates that respect the battery limits (±Infinity if none). */
  sMax: number;
  sMin: number;
  /** Among candidates that respect the limits: the one landing closest to the next feasible interval. */
  nearSlot: number;
  nearGap: number;
}

export function newStageEval(): StageEval {
  return { cost: Infinity, slot: -1, sMax: -Infinity, sMin: Infinity, nearSlot: -1, nearGap: Infinity };
}

/**
 * Scores all candidates of step k from the exact SOC s with the exact battery step (OCV,
 * P_max and charge limit at s): the forward pass of the DP and the refinement of the
 * feasible interval ends use this.
 */
export function evaluateStage(t: CandidateTables, bs: BatteryStep, c: CostToGo, k: number, s: number, r: StageEval): void {
  const b = bs.battery;
  const u = b.ocv_v(s);
  const pMax = b.maxPower_w(u);
  const brakes = t.braking[k] !== 0;
  const cl = brakes ? b.chargeLimit_w(s, t.dt_s) : 0;
  const lo1 = c.lo[k + 1] - EDGE_TOL;
  const hi1 = c.hi[k + 1] + EDGE_TOL;
  r.cost = Infinity; r.slot = -1; r.sMax = -Infinity; r.sMin = Infinity; r.nearSlot = -1; r.nearGap = Infinity;
  for (let slot = t.start[k], end = t.start[k + 1]; slot < end; slot++) {
    const p = brakes ? BatteryStep.brakingBus(t.bus_w[slot], t.busOther_w[slot], cl) : t.bus_w[slot];
    const i = bs.current_a(u, pMax, p);
    if (i === Infinity) continue;
    const s1 = bs.next(s, i);
    if (s1 < 0) continue;
    if (s1 > r.sMax) r.sMax = s1;
    if (s1 < r.sMin) r.sMin = s1;
    const gap = s1 < lo1 ? lo1 - s1 : s1 > hi1 ? s1 - hi1 : 0;
    if (gap < r.nearGap || (gap === r.nearGap && r.nearSlot >= 0 && t.stage_j[slot] < t.stage_j[r.nearSlot])) {
      r.nearGap = gap;
      r.nearSlot = slot;
    }
    if (gap > 0) continue;
    const cost = t.stage_j[slot] + interpolate(c, k + 1, s1);
    if (cost < r.cost) {
      r.cost = cost;
      r.slot = slot;
    }
  }
}
