import { buildCandidateTables, type CandidateTables, type HybridPlant } from "./tables";
import { BatteryStep } from "./battery-step";
import { backwardPass, type BackwardOutcome } from "./backward";
import { DpStrategy } from "./forward";

export interface DpSettings {
  socPoints: number;
  controlPoints: number;
  socFinalMin: number;
  socFinalMax: number;
}

export interface DpRunOptions {
  signal?: AbortSignal;
  onProgress?: (share: number) => void;
  /** Tables already built for the same plant and control points (they do not depend on the SOC grid). */
  tables?: CandidateTables;
}

export interface DpPlan {
  settings: DpSettings;
  tables: CandidateTables;
  backward: BackwardOutcome;
  strategy: DpStrategy;
  /** Whether the initial SOC lies in the feasible interval of step 0 (the window can be met). */
  reachable: boolean;
}

/** Backward pass + forward strategy for a hybrid plant (simulate the strategy to get the exact run). */
export function planDp(plant: HybridPlant, s: DpSettings, o: DpRunOptions = {}): DpPlan {
  const tables = o.tables ?? buildCandidateTables(plant, s.controlPoints);
  const bs = new BatteryStep(plant.battery, plant.demand.dt_s);
  const backward = backwardPass(tables, bs, {
    socPoints: s.socPoints, socFinalMin: s.socFinalMin, socFinalMax: s.socFinalMax,
    signal: o.signal, onProgress: o.onProgress,
  });
  const c = backward.ctg;
  const s0 = plant.battery.socInitial;
  const reachable = backward.emptyFromStep < 0 && s0 >= c.lo[0] - 1e-12 && s0 <= c.hi[0] + 1e-12;
  return { settings: s, tables, backward, strategy: new DpStrategy(plant, tables, bs, c), reachable };
}

/** SOC points of the coarser pass for the grid-sensitivity check: every other grid point. */
export function coarserSocPoints(socPoints: number): number {
  return Math.max(2, Math.floor((socPoints - 1) / 2) + 1);
}
