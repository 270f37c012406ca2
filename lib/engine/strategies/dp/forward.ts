import type { Strategy } from "../strategy";
import type { CandidateTables, HybridPlant } from "./tables";
import type { BatteryStep } from "./battery-step";
import type { CostToGo } from "./cost-to-go";
import { evaluateStage, newStageEval } from "./stage";
import { leastViolatingSlot } from "./fallback";

/**
 * Forward pass of the DP as a strategy: at step k from the exact SOC (as simulated by the
 * plant's exact step model, regeneration curtailed by the charge limit), the candidate that
 * minimises stage cost + interpolated cost-to-go at its exact next SOC. When no candidate
 * keeps the terminal window reachable (the window cannot be met from here), it takes the
 * candidate that lands closest to the feasible interval within the limits, and counts the
 * step, so the caller can say so.
 */
export class DpStrategy implements Strategy {
  readonly kind = "dp";
  /** Steps decided without a finite cost-to-go, and the first of them (-1 if none). */
  offPlanSteps = 0;
  firstOffPlanStep = -1;
  private readonly r = newStageEval();

  constructor(
    private readonly plant: HybridPlant,
    private readonly tables: CandidateTables,
    private readonly bs: BatteryStep,
    readonly ctg: CostToGo,
  ) {}

  reset(): void {
    this.offPlanSteps = 0;
    this.firstOffPlanStep = -1;
  }

  decide(k: number, soc: number, ctl: Float64Array): void {
    const t = this.tables;
    const r = this.r;
    evaluateStage(t, this.bs, this.ctg, k, soc, r);
    let slot = r.slot;
    if (slot < 0) {
      this.offPlanSteps++;
      if (this.firstOffPlanStep < 0) this.firstOffPlanStep = k;
      slot = r.nearSlot >= 0 ? r.nearSlot : leastViolatingSlot(t, this.bs, k, soc);
    }
    this.plant.candidate(k, t.index[slot], t.controlPoints, ctl);
  }
}
