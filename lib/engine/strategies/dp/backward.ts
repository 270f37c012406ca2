import type { CandidateTables } from "./tables";
import type { BatteryStep } from "./battery-step";
import { EDGE_TOL, allocCostToGo, virtualise, type CostToGo } from "./cost-to-go";
import { newStageEval } from "./stage";
import { locateInterval } from "./edges";
import { gridTables, type GridTables } from "./grid";

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

function setTerminal(c: CostToGo, o: BackwardOptions): void {
  const m = c.socPoints;
  const base = c.n * c.stride;
  for (let i = 0; i < m; i++) {
    const s = c.soc0 + i * c.h;
    c.J[base + i] = s >= o.socFinalMin - EDGE_TOL && s <= o.socFinalMax + EDGE_TOL ? 0 : Infinity;
  }
  c.lo[c.n] = o.socFinalMin;
  c.hi[c.n] = o.socFinalMax;
  c.jLo[c.n] = 0;
  c.jHi[c.n] = 0;
  virtualise(c, c.n);
}

/**
 * No SOC of step k can meet the window. The row is infinite; the interval keeps the next
 * step's (ultimately the terminal window) so that the forward pass can still steer towards
 * it and land as close as the limits allow, which the findings then report.
 */
function markEmpty(c: CostToGo, k: number): void {
  c.J.fill(Infinity, k * c.stride, (k + 1) * c.stride);
  c.lo[k] = c.lo[k + 1];
  c.hi[k] = c.hi[k + 1];
  c.jLo[k] = Infinity;
  c.jHi[k] = Infinity;
}

/**
 * Backward pass of deterministic DP (DESIGN §4) over the SOC grid × the candidate set.
 * Stage cost = fuel energy of the step (tables.stage_j). From grid SOC s the move of a
 * candidate with bus power P is exact: SOC' = s − (dt/Q)·I with I from the battery quadratic
 * at U_oc(s). Every battery limit (P_max, current limits, SOC window within the step) and
 * the next step's feasible interval are turned into one power interval [pLo, pHi] per grid
 * point (P(I) = U·I − R·I² rises with I below U/2R), so the loop over candidates does one
 * comparison pair, one square root and one interpolation, and allocates nothing.
 * The cost-to-go at the exact SOC' uses the feasibility-aware rule of cost-to-go.ts.
 */
export function backwardPass(t: CandidateTables, bs: BatteryStep, o: BackwardOptions): BackwardOutcome {
  const n = t.n;
  const m = o.socPoints;
  const c = allocCostToGo(n, m, bs.battery.socMin, bs.battery.socMax);
  const g = gridTables(bs, c, t.dt_s);
  const r = newStageEval();
  const every = o.checkEvery ?? 64;
  setTerminal(c, o);
  let emptyFromStep = -1;
  for (let k = n - 1; k >= 0; k--) {
    if ((n - 1 - k) % every === 0) {
      if (o.signal?.aborted) throw o.signal.reason ?? new Error("aborted");
      o.onProgress?.((n - 1 - k) / n);
    }
    if (emptyFromStep >= 0) { markEmpty(c, k); continue; }
    stepRow(t, bs, c, g, k);
    if (locateInterval(t, bs, c, k, g.soc, r)) virtualise(c, k);
    else {
      emptyFromStep = k;
      markEmpty(c, k);
    }
  }
  o.onProgress?.(1);
  return { ctg: c, emptyFromStep };
}

/** Terminal power of current i at OCV u (DESIGN §4 battery). */
function power(u: number, r: number, i: number): number {
  return u * i - r * i * i;
}

/** Row k of the cost-to-go from row k + 1: the hot loop. */
function stepRow(t: CandidateTables, bs: BatteryStep, c: CostToGo, g: GridTables, k: number): void {
  const m = c.socPoints;
  const J = c.J;
  const s0 = c.soc0, invH = c.invH;
  const bus = t.bus_w, other = t.busOther_w, stage = t.stage_j;
  const rOhm = bs.battery.resistance_ohm, r4 = bs.r4, perAmp = bs.socPerAmp;
  const linear = rOhm === 0;
  const half = linear ? 0 : perAmp / (2 * rOhm); // SOC' = s − perAmp·U/(2R) + half·√(U² − 4RP)
  const lo1 = c.lo[k + 1], hi1 = c.hi[k + 1];
  const row = k * c.stride, next = (k + 1) * c.stride;
  const first = t.start[k], last = t.start[k + 1];
  const brakes = t.braking[k] !== 0;
  const sc = g.scratch;
  for (let i = 0; i < m; i++) {
    const s = g.soc[i], u = g.u[i], cl = g.chargeLimit[i], peakI = g.peakCurrent[i];
    // Landing in [lo1, hi1] ⟺ (s − hi1)/Δ ≤ I ≤ (s − lo1)/Δ, with Δ = SOC per ampere.
    const iUp = (s - lo1 + EDGE_TOL) / perAmp;
    const iDown = (s - hi1 - EDGE_TOL) / perAmp;
    let pHi = g.dischargeLimit[i];
    if (iUp < peakI) { const pw = power(u, rOhm, iUp); if (pw < pHi) pHi = pw; }
    let pLo = cl;
    if (iDown > peakI) pLo = Infinity;
    else { const pw = power(u, rOhm, iDown); if (pw > pLo) pLo = pw; }
    const base = s - perAmp * (linear ? 0 : u / (2 * rOhm));
    sc[4 * i] = pLo;
    sc[4 * i + 1] = pHi;
    sc[4 * i + 2] = u * u;
    sc[4 * i + 3] = (base - s0) * invH;
  }
  if (!brakes && !linear) {
    const hs = half * invH;
    let i = 0;
    for (; i + 1 < m; i += 2) bestPair(J, next, row + i, sc, 4 * i, stage, bus, first, last, r4, hs);
    if (i < m) J[row + i] = bestNonBraking(J, next, stage, bus, first, last, sc[4 * i], sc[4 * i + 1], sc[4 * i + 2], r4, sc[4 * i + 3], hs);
    return;
  }
  for (let i = 0; i < m; i++) {
    const s = g.soc[i], u = g.u[i], u2 = u * u, cl = g.chargeLimit[i];
    const pLo = sc[4 * i], pHi = sc[4 * i + 1];
    const base = s - perAmp * (linear ? 0 : u / (2 * rOhm));
    const perWatt = linear ? perAmp / u : 0;
    let best: number;
    best = Infinity;
    for (let slot = first; slot < last; slot++) {
      let p = bus[slot];
      if (brakes) {
        const o2 = other[slot];
        const curtailed = cl < o2 ? cl : o2;
        if (curtailed > p) p = curtailed;
      }
      if (p > pHi || p < pLo) continue;
      let s1: number;
      if (linear) s1 = s - perWatt * p;
      else {
        const disc = u2 - r4 * p;
        s1 = base + half * Math.sqrt(disc > 0 ? disc : 0);
      }
      // [pLo, pHi] keeps SOC' within [lo1, hi1] (±1e-12), where the stored row interpolates exactly (cost-to-go.ts).
      const pos = (s1 - s0) * invH;
      const idx = pos | 0;
      const a = J[next + idx];
      const cost = stage[slot] + a + (pos - idx) * (J[next + idx + 1] - a);
      if (cost < best) best = cost;
    }
    J[row + i] = best;
  }
}

/**
 * The hot loop for a traction or standstill step (bus power independent of SOC) with R > 0:
 * grid position of SOC' = b0 + hs·√(U² − 4R·P) (b0 = (s − Δ·U/2R − soc0)/h, hs = Δ/(2R·h)).
 * Kept as its own small function so that the JIT keeps its few values in registers.
 */
function bestNonBraking(J: Float64Array, next: number, stage: Float64Array, bus: Float64Array, first: number, last: number,
  pLo: number, pHi: number, u2: number, r4: number, b0: number, hs: number): number {
  let best = Infinity;
  for (let slot = first; slot < last; slot++) {
    const p = bus[slot];
    if (p > pHi || p < pLo) continue;
    const disc = u2 - r4 * p;
    const pos = b0 + hs * Math.sqrt(disc > 0 ? disc : 0);
    const idx = pos | 0;
    const a = J[next + idx];
    const cost = stage[slot] + a + (pos - idx) * (J[next + idx + 1] - a);
    if (cost < best) best = cost;
  }
  return best;
}

/**
 * bestNonBraking for two neighbouring grid points at once: each candidate's bus power and
 * stage cost are read once for both, and the two independent chains keep the CPU busier.
 * `sc` holds per grid point [pLo, pHi, U², b0]; writes the two minima to J[out], J[out + 1].
 */
function bestPair(J: Float64Array, next: number, out: number, sc: Float64Array, o: number, stage: Float64Array, bus: Float64Array,
  first: number, last: number, r4: number, hs: number): void {
  const loA = sc[o], hiA = sc[o + 1], u2A = sc[o + 2], b0A = sc[o + 3];
  const loB = sc[o + 4], hiB = sc[o + 5], u2B = sc[o + 6], b0B = sc[o + 7];
  let bestA = Infinity, bestB = Infinity;
  for (let slot = first; slot < last; slot++) {
    const p = bus[slot];
    const st = stage[slot];
    const q = r4 * p;
    if (p <= hiA && p >= loA) {
      const d = u2A - q;
      const pos = b0A + hs * Math.sqrt(d > 0 ? d : 0);
      const idx = pos | 0;
      const a = J[next + idx];
      const cost = st + a + (pos - idx) * (J[next + idx + 1] - a);
      if (cost < bestA) bestA = cost;
    }
    if (p <= hiB && p >= loB) {
      const d = u2B - q;
      const pos = b0B + hs * Math.sqrt(d > 0 ? d : 0);
      const idx = pos | 0;
      const a = J[next + idx];
      const cost = st + a + (pos - idx) * (J[next + idx + 1] - a);
      if (cost < bestB) bestB = cost;
    }
  }
  J[out] = bestA;
  J[out + 1] = bestB;
}
