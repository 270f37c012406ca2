import type { CandidateTables } from "./tables";
import { BatteryStep } from "./battery-step";
import { EDGE_TOL, allocCostToGo, interpolateAtEdge, type CostToGo } from "./cost-to-go";
import { evaluateStage, newStageEval, type StageEval } from "./stage";
import { locateEdge } from "./edges";

export interface BackwardOptions {
  socPoints: number;
  socFinalMin: number;
  socFinalMax: number;
  /** Checked every `checkEvery` steps; an aborted signal stops the pass with its reason. */
  signal?: AbortSignal;
  /** Share of backward steps done, 0..1, reported every `checkEvery` steps and at the end. */
  onProgress?: (share: number) => void;
  checkEvery?: number;
}

export interface BackwardOutcome {
  ctg: CostToGo;
  /** Latest step (0-based) from which no SOC can reach the terminal window, or -1. */
  emptyFromStep: number;
}

/** Per-grid-point battery quantities that depend only on SOC (precomputed once: OCV lookups are the costly part). */
function gridTables(bs: BatteryStep, c: CostToGo, dt_s: number) {
  const m = c.socPoints;
  const buf = new Float64Array(4 * m);
  const soc = buf.subarray(0, m), u = buf.subarray(m, 2 * m), pMax = buf.subarray(2 * m, 3 * m), cl = buf.subarray(3 * m);
  for (let i = 0; i < m; i++) {
    soc[i] = i === m - 1 ? bs.battery.socMax : c.soc0 + i * c.h;
    u[i] = bs.battery.ocv_v(soc[i]);
    pMax[i] = bs.battery.maxPower_w(u[i]);
    cl[i] = bs.battery.chargeLimit_w(soc[i], dt_s);
  }
  return { soc, u, pMax, cl };
}

function setTerminal(c: CostToGo, o: BackwardOptions): void {
  const m = c.socPoints;
  const base = c.n * m;
  for (let i = 0; i < m; i++) {
    const s = c.soc0 + i * c.h;
    c.J[base + i] = s >= o.socFinalMin - EDGE_TOL && s <= o.socFinalMax + EDGE_TOL ? 0 : Infinity;
  }
  c.lo[c.n] = o.socFinalMin;
  c.hi[c.n] = o.socFinalMax;
  c.jLo[c.n] = 0;
  c.jHi[c.n] = 0;
}

function markEmpty(c: CostToGo, k: number): void {
  c.J.fill(Infinity, k * c.socPoints, (k + 1) * c.socPoints);
  c.lo[k] = Infinity;
  c.hi[k] = -Infinity;
  c.jLo[k] = Infinity;
  c.jHi[k] = Infinity;
}

/**
 * Backward pass of deterministic DP (DESIGN §4) over the SOC grid × the candidate set.
 * Stage cost = fuel energy of the step (tables.stage_j); the SOC move of each (grid SOC,
 * candidate) uses the exact battery quadratic with the OCV of that grid point; the next
 * cost-to-go is interpolated at the exact next SOC with the feasibility-aware rule of
 * cost-to-go.ts. Time: O(n · socPoints · candidates), no allocation in the loop.
 */
export function backwardPass(t: CandidateTables, bs: BatteryStep, o: BackwardOptions): BackwardOutcome {
  const n = t.n;
  const m = o.socPoints;
  const c = allocCostToGo(n, m, bs.battery.socMin, bs.battery.socMax);
  const g = gridTables(bs, c, t.dt_s);
  const sMaxG = new Float64Array(m);
  const sMinG = new Float64Array(m);
  const r: StageEval = newStageEval();
  const every = o.checkEvery ?? 64;
  const J = c.J;
  const s0 = c.soc0, invH = c.invH;
  const start = t.start, bus = t.bus_w, other = t.busOther_w, stage = t.stage_j;
  const r4 = bs.r4, socPerAmp = bs.socPerAmp, iDis = bs.maxDischarge_a, iChg = bs.maxCharge_a;
  const socLo = bs.socMin, socHi = bs.socMax;
  setTerminal(c, o);
  let emptyFromStep = -1;
  for (let k = n - 1; k >= 0; k--) {
    if ((n - 1 - k) % every === 0) {
      if (o.signal?.aborted) throw o.signal.reason ?? new Error("aborted");
      o.onProgress?.((n - 1 - k) / n);
    }
    if (emptyFromStep >= 0) { markEmpty(c, k); continue; }
    const lo1 = c.lo[k + 1] - EDGE_TOL, hi1 = c.hi[k + 1] + EDGE_TOL;
    const row = k * m, next = (k + 1) * m;
    const first = start[k], last = start[k + 1];
    const brakes = t.braking[k] !== 0;
    for (let i = 0; i < m; i++) {
      const s = g.soc[i], u = g.u[i], u2 = u * u, pMax = g.pMax[i], cl = g.cl[i];
      let best = Infinity, sMax = -Infinity, sMin = Infinity;
      for (let slot = first; slot < last; slot++) {
        let p = bus[slot];
        if (brakes) {
          const o2 = other[slot];
          const cur = cl < o2 ? cl : o2;
          if (cur > p) p = cur;
        }
        if (p > pMax) continue;
        const disc = u2 - r4 * p;
        const cur = (2 * p) / (u + Math.sqrt(disc > 0 ? disc : 0));
        if (cur > iDis || -cur > iChg) continue;
        const s1 = s - cur * socPerAmp;
        if (cur > 0 ? s1 < socLo : cur < 0 && s1 > socHi) continue;
        if (s1 > sMax) sMax = s1;
        if (s1 < sMin) sMin = s1;
        if (s1 < lo1 || s1 > hi1) continue;
        let pos = (s1 - s0) * invH;
        if (pos < 0) pos = 0;
        let idx = pos | 0;
        if (idx > m - 2) idx = m - 2;
        const a = J[next + idx], b = J[next + idx + 1];
        const v = a + b < Infinity ? a + (pos - idx) * (b - a) : interpolateAtEdge(c, k + 1, s1, idx, a, b);
        const cost = stage[slot] + v;
        if (cost < best) best = cost;
      }
      J[row + i] = best;
      sMaxG[i] = sMax;
      sMinG[i] = sMin;
    }
    if (!locateEdges(t, bs, c, k, g.soc, sMaxG, sMinG, r)) {
      emptyFromStep = k;
      markEmpty(c, k);
    }
  }
  o.onProgress?.(1);
  return { ctg: c, emptyFromStep };
}

/**
 * Feasible interval of step k: {s : sMax(s) ≥ lo_{k+1}} ∩ {s : sMin(s) ≤ hi_{k+1}}, the
 * reachable next-SOC range overlapping the next interval (sMax and sMin rise with s).
 * Ends between grid points are located on the exact model (edges.ts). Returns false when
 * the interval is empty.
 */
function locateEdges(t: CandidateTables, bs: BatteryStep, c: CostToGo, k: number, soc: Float64Array, sMaxG: Float64Array, sMinG: Float64Array, r: StageEval): boolean {
  const m = c.socPoints;
  const lo1 = c.lo[k + 1], hi1 = c.hi[k + 1];
  let iLo = -1;
  for (let i = 0; i < m; i++) if (sMaxG[i] >= lo1 - EDGE_TOL) { iLo = i; break; }
  let iHi = -1;
  for (let i = m - 1; i >= 0; i--) if (sMinG[i] <= hi1 + EDGE_TOL) { iHi = i; break; }
  if (iLo < 0 || iHi < 0) return false;
  // An end between grid points is located on the exact model: the interval may even lie
  // inside one cell when the grid is coarser than the window or one step's SOC change.
  const lo = iLo === 0 ? soc[0] : locateEdge(t, bs, c, k, soc[iLo - 1], soc[iLo], true, r);
  const hi = iHi === m - 1 ? soc[m - 1] : locateEdge(t, bs, c, k, soc[iHi], soc[iHi + 1], false, r);
  if (!(lo <= hi)) return false;
  c.lo[k] = lo;
  c.hi[k] = hi;
  c.jLo[k] = lo === soc[0] ? c.J[k * m] : stageCost(t, bs, c, k, lo, r);
  c.jHi[k] = hi === soc[m - 1] ? c.J[k * m + m - 1] : stageCost(t, bs, c, k, hi, r);
  return true;
}

function stageCost(t: CandidateTables, bs: BatteryStep, c: CostToGo, k: number, s: number, r: StageEval): number {
  evaluateStage(t, bs, c, k, s, r);
  return r.cost;
}
