import type { CandidateTables } from "./tables";
import type { BatteryStep } from "./battery-step";
import { EDGE_TOL, type CostToGo } from "./cost-to-go";
import { evaluateStage, type StageEval } from "./stage";

/** Bracket width (SOC) at which an interval end counts as located. */
const SOC_TOL = 1e-13;
const MAX_ITER = 60;

/**
 * Step k's feasible SOC interval: {s : sMax(s) ≥ lo_{k+1}} ∩ {s : sMin(s) ≤ hi_{k+1}}, where
 * sMax / sMin are the highest / lowest next SOC over candidates within the battery limits
 * at s (both rise with s). Grid cells holding an end are found by bisection over the grid,
 * the ends inside them on the exact model; the cost-to-go at each end is evaluated there.
 * Returns false when the interval is empty (the terminal window cannot be reached).
 */
export function locateInterval(t: CandidateTables, bs: BatteryStep, c: CostToGo, k: number, soc: Float64Array, r: StageEval): boolean {
  const m = c.socPoints;
  const lo1 = c.lo[k + 1] - EDGE_TOL, hi1 = c.hi[k + 1] + EDGE_TOL;
  const up = (s: number) => (evaluateStage(t, bs, c, k, s, r), r.sMax - lo1); // rises with s
  const down = (s: number) => (evaluateStage(t, bs, c, k, s, r), hi1 - r.sMin); // falls with s
  let lo: number;
  if (up(soc[0]) >= 0) lo = soc[0];
  else if (!(up(soc[m - 1]) >= 0)) return false;
  else {
    const i = firstIndex(m, (j) => up(soc[j]) >= 0);
    lo = refine(up, soc[i - 1], soc[i]);
  }
  let hi: number;
  if (down(soc[m - 1]) >= 0) hi = soc[m - 1];
  else if (!(down(soc[0]) >= 0)) return false;
  else {
    const i = firstIndex(m, (j) => !(down(soc[j]) >= 0));
    hi = refine(down, soc[i], soc[i - 1]);
  }
  if (!(lo <= hi)) return false;
  const row = k * c.stride;
  c.lo[k] = lo;
  c.hi[k] = hi;
  c.jLo[k] = lo === soc[0] ? c.J[row] : (evaluateStage(t, bs, c, k, lo, r), r.cost);
  c.jHi[k] = hi === soc[m - 1] ? c.J[row + m - 1] : (evaluateStage(t, bs, c, k, hi, r), r.cost);
  return true;
}

/** Smallest j in 1..m−1 with pred(j) true, given pred(0) false and pred(m−1) true (pred monotone). */
function firstIndex(m: number, pred: (j: number) => boolean): number {
  let a = 0, b = m - 1;
  while (b - a > 1) {
    const mid = (a + b) >> 1;
    if (pred(mid)) b = mid;
    else a = mid;
  }
  return b;
}

/**
 * Root of f between x (f < 0) and y (f ≥ 0): regula falsi with the Illinois modification,
 * bisection while a side is infinite (no eligible candidate there). Returns the end on the
 * feasible side, so the located end is itself feasible.
 */
function refine(f: (s: number) => number, x: number, y: number): number {
  let fx = f(x);
  let fy = f(y);
  if (fx >= 0) return x;
  if (!(fy >= 0)) return y;
  let side = 0;
  for (let it = 0; it < MAX_ITER && Math.abs(y - x) > SOC_TOL; it++) {
    let z = 0.5 * (x + y);
    if (Number.isFinite(fx) && Number.isFinite(fy)) {
      const zf = (x * fy - y * fx) / (fy - fx);
      if (zf > Math.min(x, y) && zf < Math.max(x, y)) z = zf;
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
