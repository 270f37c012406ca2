import type { Strategy } from "../strategy";
import type { Finding } from "../../findings";
import { simulate, type Run } from "../../simulate";
import type { HybridPlant } from "./tables";
import { coarserSocPoints, planDp, type DpPlan, type DpRunOptions, type DpSettings } from "./solve";
import { dpGridFinding, dpWindowFindings } from "./findings";

/**
 * DP as an energy manager for the simulator: the backward pass runs when it is built; the
 * simulator's forward pass is the DP forward pass (exact model). After the run it reports
 * the window and, unless disabled, the grid-sensitivity check (a second pass with every
 * other SOC point).
 */
export class DpManager implements Strategy {
  readonly kind = "dp";
  readonly plan: DpPlan;

  constructor(private readonly plant: HybridPlant, readonly settings: DpSettings, private readonly opts: DpRunOptions & { gridCheck?: boolean } = {}) {
    this.plan = planDp(plant, settings, opts);
  }

  reset(socInitial: number): void {
    this.plan.strategy.reset();
    void socInitial;
  }

  decide(k: number, soc: number, ctl: Float64Array): void {
    this.plan.strategy.decide(k, soc, ctl);
  }

  findings(run: Run): Finding[] {
    const d = this.plant.demand;
    const out = dpWindowFindings(this.plan, d, this.plant.battery.socInitial, run.socFinal);
    if (this.opts.gridCheck === false || !this.plan.reachable) return out;
    const coarse = coarserSocPoints(this.settings.socPoints);
    if (coarse >= this.settings.socPoints) return out;
    const plan = planDp(this.plant, { ...this.settings, socPoints: coarse }, { tables: this.plan.tables, signal: this.opts.signal });
    const coarseRun = simulate(this.plant, plan.strategy, this.plant.battery.socInitial);
    const g = dpGridFinding(this.settings.socPoints, run.ledger.fuel, coarse, coarseRun.ledger.fuel);
    if (g) out.push(g);
    return out;
  }
}
