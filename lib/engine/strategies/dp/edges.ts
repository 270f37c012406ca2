import type { CandidateTables } from "./tables";
import type { BatteryStep } from "./battery-step";
import { EDGE_TOL, type CostToGo } from "./cost-to-go";
import { evaluateStage, type StageEval } from "./stage";

/** Bracket width (SOC) at which an interval end counts as located. */
const SOC_TOL = 1e-13;
const MAX_ITER = 60;

/**
 * Locates an end of step k's feasible SOC interval inside the cell [a, b] on the exact step
 * model (regula falsi with the Illinois modification, bisection where a side has no
 * eligible candidate). Lower end: f(s) = sMax(s) − lo_{k+1}, feasible at b. Upper end:
 * f(s) = hi_{k+1} − sMin(s), feasible at a. Returns the bracket end on the feasible side,
 * so the located end is itself feasible.
 */
export function locateEdge(t: CandidateTables, bs: BatteryStep, c: CostToGo, k: number, a: number, b: number, lower: boolean, r: StageEval): number {
  const target = lower ? c.lo[k + 1] - EDGE_TOL : c.hi[k + 1] + EDGE_TOL;
  const f = (s: number): number => {
    evaluateStage(t, bs, c, k, s, r);
    return lower ? r.sMax - target : target - r.sMin;
  };
  // Orient so that fx < 0 ≤ fy with x the infeasible and y the feasible end.
  let x = lower ? a : b;
  let y = lower ? b : a;
  let fx = f(x);
  let fy = f(y);
  if (fx >= 0) return x;
  if (!(fy >= 0)) return y; // non-monotone corner case: keep the grid point
  let side = 0;
  for (let it = 0; it < MAX_ITER && Math.abs(y - x) > SOC_TOL; it++) {
    let z: number;
    if (Number.isFinite(fx) && Number.isFinite(fy)) {
      z = (x * fy - y * fx) / (fy - fx);
      if (!(z > Math.min(x, y) && z < Math.max(x, y))) z = 0.5 * (x + y);
    } else {
      z = 0.5 * (x + y);
    }
    const fz = f(z);
    if (fz >= 0) {
      y = z; fy = fz;
      if (side === 1) fx *= 0.5;
      side = 1;
    } else {
      x = z; fx = fz;
      if (side === -1) fy *= 0.5;
      side = -1;
    }
  }
  return y;
}
