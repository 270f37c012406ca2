import type { Strategy } from "./strategy";
import type { CandidateTables, HybridPlant } from "./dp/tables";
import { BatteryStep } from "./dp/battery-step";
import { leastViolatingSlot } from "./dp/fallback";

export interface EcmsParams {
  /** s0: J of fuel per J of battery chemical energy. */
  equivalenceFactor: number;
  /** k in s = s0 + k·(soc_target − SOC), per unit SOC. */
  socFeedbackGain: number;
  socTarget: number;
}

/**
 * ECMS with SOC feedback (DESIGN §4): at each step, among the eligible candidates of the
 * DESIGN §4 candidate set that respect the battery limits at the current SOC, the one with
 * the least fuel power + s·U_oc·I (battery chemical power), s = s0 + k·(soc_target − SOC).
 * Candidates are scored on the per-cycle tables with the exact battery step, the same
 * arithmetic as the plant, so the choice is exact; the simulator then applies it.
 */
export class EcmsStrategy implements Strategy {
  readonly kind = "ecms";
  /** Steps where no candidate respected the limits (the least violating one was taken). */
  forcedSteps = 0;

  constructor(
    private readonly plant: HybridPlant,
    private readonly tables: CandidateTables,
    private readonly bs: BatteryStep,
    private readonly p: EcmsParams,
  ) {}

  reset(): void {
    this.forcedSteps = 0;
  }

  decide(k: number, soc: number, ctl: Float64Array): void {
    const slot = this.choose(k, soc);
    this.plant.candidate(k, this.tables.index[slot], this.tables.controlPoints, ctl);
  }

  /** Table slot of the chosen candidate. */
  choose(k: number, soc: number): number {
    const t = this.tables;
    const bs = this.bs;
    const b = bs.battery;
    const u = b.ocv_v(soc);
    const pMax = b.maxPower_w(u);
    const brakes = t.braking[k] !== 0;
    const cl = brakes ? b.chargeLimit_w(soc, t.dt_s) : 0;
    const weight = (this.p.equivalenceFactor + this.p.socFeedbackGain * (this.p.socTarget - soc)) * u * t.dt_s;
    let best = -1;
    let bestCost = Infinity;
    for (let slot = t.start[k], end = t.start[k + 1]; slot < end; slot++) {
      const p = brakes ? BatteryStep.brakingBus(t.bus_w[slot], t.busOther_w[slot], cl) : t.bus_w[slot];
      const i = bs.current_a(u, pMax, p);
      if (i === Infinity || bs.next(soc, i) < 0) continue;
      const cost = t.stage_j[slot] + weight * i;
      if (cost < bestCost) {
        bestCost = cost;
        best = slot;
      }
    }
    if (best >= 0) return best;
    this.forcedSteps++;
    return leastViolatingSlot(t, bs, k, soc);
  }
}
