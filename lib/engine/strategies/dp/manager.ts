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
    // Progress: the requested pass is the first 2/3 of the work, the coarser check (half the points) the rest.
    const share = opts.gridCheck === false ? 1 : 2 / 3;
    this.plan = planDp(plant, settings, { ...opts, onProgress: opts.onProgress && ((x) => opts.onProgress!(share * x)) });
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
    const coarse = coarserSocPoints(this.settings.socPoints);
    if (this.opts.gridCheck === false || !this.plan.reachable || coarse >= this.settings.socPoints) {
      this.opts.onProgress?.(1);
      return out;
    }
    const report = this.opts.onProgress;
    const plan = planDp(this.plant, { ...this.settings, socPoints: coarse }, {
      tables: this.plan.tables, signal: this.opts.signal, onProgress: report && ((x) => report(2 / 3 + x / 3)),
    });
    const coarseRun = simulate(this.plant, plan.strategy, this.plant.battery.socInitial);
    const g = dpGridFinding(this.settings.socPoints, run.ledger.fuel, coarse, coarseRun.ledger.fuel);
    if (g) out.push(g);
    return out;
  }
}
