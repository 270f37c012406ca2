import type { CandidateTables } from "./tables";
import type { BatteryStep } from "./battery-step";
import { EDGE_TOL, type CostToGo } from "./cost-to-go";
import { evaluateStage, type StageEval } from "./stage";

/** Bracket width (SOC) at which an interval end counts as located. */
const SOC_TOL = 1e-13;
const MAX_ITER = 60;

/**
 * Step k's feasible SOC interval, where some candidate within the battery limits lands in
 * [lo_{k+1}, hi_{k+1}]. Its lower end is where sMax(s) (highest next SOC over candidates
 * within the limits, rising with s) reaches lo_{k+1}; its upper end where sMin(s) reaches
 * hi_{k+1}. The grid cells holding the ends come from the finite cells of row k (or, when
 * no grid point is feasible because the interval lies inside one cell, from a scan of the
 * grid); the ends inside them are located on the exact model and the cost-to-go evaluated
 * there. Returns false when no SOC of step k can still meet the terminal window.
 */
export function locateInterval(t: CandidateTables, bs: BatteryStep, c: CostToGo, k: number, soc: Float64Array, r: StageEval): boolean {
  const m = c.socPoints;
  const row = k * c.stride;
  const lo1 = c.lo[k + 1] - EDGE_TOL, hi1 = c.hi[k + 1] + EDGE_TOL;
  const up = (s: number) => (evaluateStage(t, bs, c, k, s, r), r.sMax - lo1); // -Infinity: no candidate
  const down = (s: number) => (evaluateStage(t, bs, c, k, s, r), hi1 - r.sMin);
  let iLo = -1, iHi = -1;
  for (let i = 0; i < m; i++) if (c.J[row + i] < Infinity) { iLo = i; break; }
  let lo: number, hi: number;
  if (iLo >= 0) {
    for (let i = m - 1; i >= 0; i--) if (c.J[row + i] < Infinity) { iHi = i; break; }
    lo = iLo === 0 ? soc[0] : refine(up, soc[iLo - 1], soc[iLo]);
    hi = iHi === m - 1 ? soc[m - 1] : refine(down, soc[iHi + 1], soc[iHi]);
  } else {
    // No feasible grid point: the interval, if any, lies inside one cell, or the grid points
    // around it have no eligible candidate at all (e.g. at soc_min at standstill).
    for (let i = 0; i < m && iLo < 0; i++) if (up(soc[i]) >= 0) iLo = i;
    if (iLo < 0) return false;
    lo = iLo === 0 ? soc[0] : refine(up, soc[iLo - 1], soc[iLo]);
    if (!(down(lo) >= 0)) return false;
    for (let i = m - 1; i >= iLo && iHi < 0; i--) if (down(soc[i]) >= 0) iHi = i;
    if (iHi < 0) hi = refine(down, soc[iLo], lo);
    else hi = iHi === m - 1 ? soc[m - 1] : refine(down, soc[iHi + 1], soc[iHi]);
    if (iHi < 0) iHi = iLo; // for the value lookup below: hi lies in the cell below soc[iLo]
  }
  if (!(lo <= hi)) return false;
  c.lo[k] = lo;
  c.hi[k] = hi;
  c.jLo[k] = lo === soc[iLo] ? c.J[row + iLo] : (evaluateStage(t, bs, c, k, lo, r), r.cost);
  c.jHi[k] = hi === soc[iHi] ? c.J[row + iHi] : (evaluateStage(t, bs, c, k, hi, r), r.cost);
  // Nothing finite to interpolate from: the window is out of reach in practice.
  return c.jLo[k] < Infinity || c.jHi[k] < Infinity || c.J[row + iLo] < Infinity;
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
