// Headline-figure and ledger deltas between two result summaries, plus the waterfall from
// A's energy use to B's: one bar per sink that changed, so the bars explain the difference.
import { SINK_KEYS, SUPPLY_KEYS, type Kpi, type Ledger } from "@/lib/engine";
import { KPI_ROWS, LEDGER_LABELS } from "./labels";
import type { KpiDelta, LedgerDelta, ResultSummary, WaterfallStep } from "./types";

const J_PER_KWH = 3.6e6;
const num = (x: unknown): number | null => (typeof x === "number" && Number.isFinite(x) ? x : null);

export function kpiDeltas(a: ResultSummary | null, b: ResultSummary | null): KpiDelta[] {
  return KPI_ROWS.map(({ key, label, unit }) => {
    const from = kpiValue(a?.kpi, key);
    const to = kpiValue(b?.kpi, key);
    const f = num(from);
    const t = num(to);
    const delta = f !== null && t !== null ? t - f : null;
    const relative = delta !== null && f !== null && f !== 0 ? delta / Math.abs(f) : null;
    return { key, label, unit, from, to, delta, relative };
  });
}

function kpiValue(kpi: Kpi | undefined, key: keyof Kpi): number | boolean | null {
  if (!kpi) return null;
  const v = kpi[key];
  return typeof v === "boolean" ? v : num(v);
}

export function ledgerDeltas(a: ResultSummary | null, b: ResultSummary | null): LedgerDelta[] {
  const rows = (keys: readonly (keyof Ledger)[], side: LedgerDelta["side"]) =>
    keys.map((key): LedgerDelta => {
      const from_j = a ? num(a.ledger_j[key]) : null;
      const to_j = b ? num(b.ledger_j[key]) : null;
      return { key, label: LEDGER_LABELS[key], side, from_j, to_j, delta_j: from_j !== null && to_j !== null ? to_j - from_j : null };
    });
  return [...rows(SUPPLY_KEYS, "supply"), ...rows(SINK_KEYS, "sink")];
}

function sinkTotal_j(l: Ledger): number {
  return SINK_KEYS.reduce((s, k) => s + (num(l[k]) ?? 0), 0);
}

/**
 * Total of all sinks in A (= energy supplied, the ledger closes), then each sink's change in
 * ledger order, then B's total. Sinks whose change is below `minShare` of A's total are merged
 * into one "other" bar so the chart stays readable; the bars still add up exactly.
 */
export function waterfall(a: ResultSummary, b: ResultSummary, minShare = 1e-4): WaterfallStep[] {
  const startA = sinkTotal_j(a.ledger_j) / J_PER_KWH;
  const endB = sinkTotal_j(b.ledger_j) / J_PER_KWH;
  const steps: WaterfallStep[] = [{ key: "total_a", label: "A: energy used", kind: "total", start_kwh: 0, end_kwh: startA, delta_kwh: startA, order: 0 }];
  let level = startA;
  let other = 0;
  const push = (key: string, label: string, d: number) => {
    steps.push({ key, label, kind: d >= 0 ? "increase" : "decrease", start_kwh: level, end_kwh: level + d, delta_kwh: d, order: steps.length });
    level += d;
  };
  for (const key of SINK_KEYS) {
    const d = ((num(b.ledger_j[key]) ?? 0) - (num(a.ledger_j[key]) ?? 0)) / J_PER_KWH;
    if (d === 0) continue;
    if (Math.abs(d) < minShare * Math.abs(startA)) other += d;
    else push(key, LEDGER_LABELS[key], d);
  }
  if (other !== 0) push("other", "Other (small changes)", other);
  steps.push({ key: "total_b", label: "B: energy used", kind: "total", start_kwh: 0, end_kwh: endB, delta_kwh: endB, order: steps.length });
  return steps;
}
