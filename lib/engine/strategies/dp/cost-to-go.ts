/**
 * Cost-to-go of the DP on an SOC grid, with the exact feasible interval of every step.
 *
 * Infeasible cells are infinite. Interpolating naively between a finite and an infinite
 * neighbour gives Infinity for SOC values that are in fact feasible; step after step this
 * shrinks the feasible set and can empty it when the grid is coarser than the SOC change of
 * one step. Our rule (docs/strategies.md): every step k carries its feasible SOC interval
 * [lo_k, hi_k], located to ~1e-13 between grid points, and the cost-to-go at both ends.
 * The value at SOC s is Infinity outside the interval; inside it is the linear interpolation
 * through the finite grid points and the two interval ends. So a feasible SOC never gets an
 * infinite cost from an infeasible neighbour, and an infeasible one never gets a finite cost.
 *
 * Storage: once a row is complete it is "virtualised": the grid values next to the interval
 * ends are replaced by the extrapolation of the segment that reaches the end node, grid
 * points outside the interval copy their neighbour, and an infinite grid point inside the
 * interval (no discrete candidate lands in the window from there) takes its nearest finite
 * value. Plain linear interpolation of the stored row then gives the rule above everywhere
 * inside the interval, with no infinite value to test for in the hot loop.
 */
export interface CostToGo {
  /** Steps of the cycle; rows 0..n (row n is the terminal cost). */
  n: number;
  socPoints: number;
  /** Row stride: socPoints + 1; the extra cell repeats the last value so SOC = soc_max needs no bounds check. */
  stride: number;
  soc0: number;
  h: number;
  invH: number;
  /** Row-major (n + 1) × stride, joules; a row of an empty interval is all Infinity. */
  J: Float64Array;
  lo: Float64Array;
  hi: Float64Array;
  jLo: Float64Array;
  jHi: Float64Array;
}

/** Tolerance on the interval ends (SOC), far below any meaningful SOC difference. */
export const EDGE_TOL = 1e-12;

export function allocCostToGo(n: number, socPoints: number, socMin: number, socMax: number): CostToGo {
  const h = (socMax - socMin) / (socPoints - 1);
  const edges = new Float64Array(4 * (n + 1));
  return {
    n, socPoints, stride: socPoints + 1, soc0: socMin, h, invH: 1 / h,
    J: new Float64Array((n + 1) * (socPoints + 1)),
    lo: edges.subarray(0, n + 1), hi: edges.subarray(n + 1, 2 * (n + 1)),
    jLo: edges.subarray(2 * (n + 1), 3 * (n + 1)), jHi: edges.subarray(3 * (n + 1)),
  };
}

/** Cost-to-go at row k for SOC s: Infinity outside [lo_k, hi_k]. */
export function interpolate(c: CostToGo, k: number, s: number): number {
  if (!(s >= c.lo[k] - EDGE_TOL && s <= c.hi[k] + EDGE_TOL)) return Infinity;
  const m = c.socPoints;
  let pos = (s - c.soc0) * c.invH;
  if (pos < 0) pos = 0;
  let idx = pos | 0;
  if (idx > m - 1) idx = m - 1;
  const base = k * c.stride + idx;
  const a = c.J[base];
  const v = a + (pos - idx) * (c.J[base + 1] - a);
  return v === v ? v : Infinity; // an emptied row (all Infinity) gives Inf − Inf: infeasible, not NaN
}

/** Value on the line through (x0, v0) and (x1, v1) at x (constant when the nodes coincide). */
function line(x0: number, v0: number, x1: number, v1: number, x: number): number {
  const span = x1 - x0;
  return span > 1e-15 ? v0 + ((x - x0) * (v1 - v0)) / span : v0;
}

/**
 * Turns row k (finite where feasible, Infinity elsewhere; interval and end values set) into
 * its stored form (see the file comment). Requires a non-empty interval with at least one
 * finite node (grid point or end).
 */
export function virtualise(c: CostToGo, k: number): void {
  const m = c.socPoints;
  const J = c.J;
  const row = k * c.stride;
  const x = (i: number) => c.soc0 + i * c.h;
  const lo = c.lo[k], hi = c.hi[k];
  // Grid points inside [lo, hi]: iA..iB (may be empty when the interval lies inside one cell).
  let iA = Math.ceil((lo - c.soc0) * c.invH - 1e-9);
  let iB = Math.floor((hi - c.soc0) * c.invH + 1e-9);
  iA = iA < 0 ? 0 : iA > m ? m : iA;
  iB = iB > m - 1 ? m - 1 : iB < -1 ? -1 : iB;
  // End values: an infinite end (no candidate lands in the window from exactly there) takes the nearest finite node.
  let vLo = c.jLo[k], vHi = c.jHi[k];
  let firstFinite = -1, lastFinite = -1;
  for (let i = iA; i <= iB; i++) if (J[row + i] < Infinity) { if (firstFinite < 0) firstFinite = i; lastFinite = i; }
  if (!(vLo < Infinity)) vLo = firstFinite >= 0 ? J[row + firstFinite] : vHi;
  if (!(vHi < Infinity)) vHi = lastFinite >= 0 ? J[row + lastFinite] : vLo;
  // Interior gaps: nearest finite node (ends included).
  for (let i = iA; i <= iB; i++) {
    if (J[row + i] < Infinity) continue;
    let left = vLo, dl = x(i) - lo, right = vHi, dr = hi - x(i);
    for (let j = i - 1; j >= iA; j--) if (J[row + j] < Infinity) { left = J[row + j]; dl = x(i) - x(j); break; }
    for (let j = i + 1; j <= iB; j++) if (J[row + j] < Infinity) { right = J[row + j]; dr = x(j) - x(i); break; }
    J[row + i] = dl <= dr ? left : right;
  }
  // Cell holding lo: its left grid value extrapolates the segment from (lo, vLo) to the next node.
  if (iA > 0) {
    const v = iA <= iB ? line(lo, vLo, x(iA), J[row + iA], x(iA - 1)) : line(lo, vLo, hi, vHi, x(iA - 1));
    for (let i = 0; i < iA; i++) J[row + i] = v;
  }
  // Cell holding hi: its right grid value extrapolates the segment from the previous node to (hi, vHi).
  if (iB < m - 1) {
    const v = iA <= iB ? line(x(iB), J[row + iB], hi, vHi, x(iB + 1)) : line(lo, vLo, hi, vHi, x(iB + 1));
    for (let i = iB + 1; i < m; i++) J[row + i] = v;
  }
  J[row + m] = J[row + m - 1];
}
