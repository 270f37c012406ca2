/**
 * Cost-to-go of the DP on an SOC grid, with the exact feasible interval of every step.
 *
 * Infeasible cells hold Infinity. Interpolating naively between a finite and an infinite
 * neighbour gives Infinity for SOC values that are in fact feasible; step after step this
 * shrinks the feasible set and can empty it when the grid is coarser than the SOC change of
 * one step. Our rule (docs/strategies.md): every step k carries its feasible SOC interval
 * [lo_k, hi_k], located to 1e-12 between grid points, and the cost-to-go at both ends.
 * At an SOC s inside the interval the value is the linear interpolation between the nearest
 * finite nodes around s, where the nodes are the finite grid points plus the two interval
 * ends; outside the interval it is Infinity. So a feasible SOC never gets an infinite cost
 * from an infeasible neighbour, and an infeasible one never gets a finite cost.
 */
export interface CostToGo {
  /** Steps of the cycle; rows 0..n (row n is the terminal cost). */
  n: number;
  socPoints: number;
  /** Row stride: socPoints + 1; the extra cell repeats the last grid value so that SOC = soc_max needs no bounds check. */
  stride: number;
  soc0: number;
  h: number;
  invH: number;
  /** Row-major (n + 1) × stride, joules; Infinity where the window cannot be met. */
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
  if (s < c.lo[k] - EDGE_TOL || s > c.hi[k] + EDGE_TOL) return Infinity;
  const m = c.socPoints;
  let pos = (s - c.soc0) * c.invH;
  if (pos < 0) pos = 0;
  let idx = pos | 0;
  if (idx > m - 1) idx = m - 1;
  const base = k * c.stride + idx;
  const a = c.J[base];
  const b = c.J[base + 1];
  if (a + b < Infinity) return a + (pos - idx) * (b - a);
  return interpolateAtEdge(c, k, s, idx, a, b);
}

/**
 * Slow path: a neighbour is infeasible. Use the interval end inside the cell in its place
 * (or, when a grid point inside the interval is itself infinite because no discrete
 * candidate lands in the window, the other finite node alone).
 */
export function interpolateAtEdge(c: CostToGo, k: number, s: number, idx: number, a: number, b: number): number {
  const xl = c.soc0 + idx * c.h;
  const xr = idx < c.socPoints - 1 ? xl + c.h : xl;
  const lo = c.lo[k];
  const hi = c.hi[k];
  let x0 = NaN, v0 = Infinity, x1 = NaN, v1 = Infinity;
  if (a < Infinity) { x0 = xl; v0 = a; }
  else if (lo > xl && lo <= s + EDGE_TOL && c.jLo[k] < Infinity) { x0 = lo; v0 = c.jLo[k]; }
  if (b < Infinity) { x1 = xr; v1 = b; }
  else if (hi < xr && hi >= s - EDGE_TOL && c.jHi[k] < Infinity) { x1 = hi; v1 = c.jHi[k]; }
  if (v0 < Infinity && v1 < Infinity) {
    const span = x1 - x0;
    if (!(span > 0)) return v0 < v1 ? v0 : v1;
    let f = (s - x0) / span;
    f = f < 0 ? 0 : f > 1 ? 1 : f;
    return v0 + f * (v1 - v0);
  }
  if (v0 < Infinity) return v0;
  return v1;
}
