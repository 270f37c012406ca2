import { simulate, type Run } from "../simulate";
import type { CandidateTables, HybridPlant } from "./dp/tables";
import { BatteryStep } from "./dp/battery-step";
import { EcmsStrategy } from "./ecms";

/**
 * Equivalence-factor tools for ECMS: the factor s0 that makes a cycle charge-sustaining
 * (final SOC = initial within a tolerance), found by bisection on the final SOC (which rises
 * with s0: dearer battery energy → more charging), and a sweep of s0 against fuel and ΔSOC.
 */
export interface EcmsRunSpec {
  /** SOC feedback gain k (per unit SOC); 0 for the pure factor. */
  gain?: number;
  socTarget?: number;
}

export function runEcms(plant: HybridPlant, tables: CandidateTables, s0: number, spec: EcmsRunSpec = {}): Run {
  const b = plant.battery;
  const strategy = new EcmsStrategy(plant, tables, new BatteryStep(b, plant.demand.dt_s), {
    equivalenceFactor: s0, socFeedbackGain: spec.gain ?? 0, socTarget: spec.socTarget ?? b.socInitial,
  });
  return simulate(plant, strategy, b.socInitial);
}

export interface ChargeSustainingFactor {
  factor: number;
  socFinal: number;
  /** Final SOC − initial SOC at `factor`. */
  deltaSoc: number;
  iterations: number;
  /** False when no factor in [sMin, sMax] brackets a charge-sustaining run; `factor` is then the closer end. */
  bracketed: boolean;
  run: Run;
}

export interface BisectionOptions extends EcmsRunSpec {
  toleranceSoc?: number;
  sMin?: number;
  sMax?: number;
  maxIterations?: number;
  signal?: AbortSignal;
}

export function chargeSustainingFactor(plant: HybridPlant, tables: CandidateTables, o: BisectionOptions = {}): ChargeSustainingFactor {
  const soc0 = plant.battery.socInitial;
  const tol = o.toleranceSoc ?? 1e-3;
  const maxIt = o.maxIterations ?? 40;
  let lo = o.sMin ?? 1;
  let hi = o.sMax ?? 5;
  let it = 0;
  const at = (s: number) => {
    if (o.signal?.aborted) throw o.signal.reason ?? new Error("aborted");
    it++;
    return runEcms(plant, tables, s, o);
  };
  let runLo = at(lo);
  let runHi = at(hi);
  // Widen the bracket a few times if needed (the factor is a ratio near 1/(engine·machine efficiency)).
  for (let w = 0; w < 6 && runLo.socFinal - soc0 > tol; w++) { lo /= 2; runLo = at(lo); }
  for (let w = 0; w < 6 && soc0 - runHi.socFinal > tol; w++) { hi *= 2; runHi = at(hi); }
  const done = (s: number, run: Run, bracketed: boolean): ChargeSustainingFactor =>
    ({ factor: s, socFinal: run.socFinal, deltaSoc: run.socFinal - soc0, iterations: it, bracketed, run });
  if (Math.abs(runLo.socFinal - soc0) <= tol) return done(lo, runLo, true);
  if (Math.abs(runHi.socFinal - soc0) <= tol) return done(hi, runHi, true);
  if (runLo.socFinal > soc0 || runHi.socFinal < soc0) {
    return runLo.socFinal > soc0 ? done(lo, runLo, false) : done(hi, runHi, false);
  }
  let best = Math.abs(runLo.socFinal - soc0) < Math.abs(runHi.socFinal - soc0) ? { s: lo, run: runLo } : { s: hi, run: runHi };
  while (it < maxIt && hi - lo > 1e-9 * hi) {
    const mid = 0.5 * (lo + hi);
    const run = at(mid);
    const err = run.socFinal - soc0;
    if (Math.abs(err) < Math.abs(best.run.socFinal - soc0)) best = { s: mid, run };
    if (Math.abs(err) <= tol) break;
    if (err < 0) lo = mid;
    else hi = mid;
  }
  return done(best.s, best.run, true);
}

export interface SweepPoint {
  factor: number;
  fuel_j: number;
  socFinal: number;
  deltaSoc: number;
  batteryNet_j: number;
}

export function sweepEquivalenceFactor(plant: HybridPlant, tables: CandidateTables, factors: readonly number[], spec: EcmsRunSpec = {}): SweepPoint[] {
  const soc0 = plant.battery.socInitial;
  return factors.map((s) => {
    const run = runEcms(plant, tables, s, spec);
    return { factor: s, fuel_j: run.ledger.fuel, socFinal: run.socFinal, deltaSoc: run.socFinal - soc0, batteryNet_j: run.ledger.battery_net };
  });
}

/** n factors evenly spaced over [from, to]. */
export function factorRange(from: number, to: number, n: number): number[] {
  if (n < 2) return [from];
  return Array.from({ length: n }, (_, i) => from + ((to - from) * i) / (n - 1));
}
