// Shapes stored with a version and produced by a diff. Plain JSON: they go to PostgreSQL
// (jsonb) and over the API unchanged.
import type { Kpi, Ledger } from "@/lib/engine";
import type { BlockKind, DocSnapshot } from "@/lib/notebook";

/** Trace series kept with a version for overlays (downsampled, see summary.ts). */
export const TRACE_SERIES = ["speed_kmh", "soc", "fuel_rate_g_s", "battery_power_w", "engine_power_w", "motor_power_w", "brake_power_w"] as const;
export type TraceSeries = (typeof TRACE_SERIES)[number];

export interface TraceSubset {
  /** every kept sample's interval start, s */
  time_s: number[];
  /** the same samples of each series (min/max preserving thinning) */
  series: Record<TraceSeries, number[]>;
  /** steps of the full trace, for "1 in k shown" notes */
  steps_total: number;
}

/** What a version keeps of its Result: enough for lists, diffs and overlays without re-running the engine. */
export interface ResultSummary {
  kpi: Kpi;
  ledger_j: Ledger;
  closure_error_j: number;
  strategy: string | null;
  traces: TraceSubset;
}

/** One side of a diff: a document snapshot and (when it compiled and ran) its result summary. */
export interface VersionSide {
  label: string;
  doc: DocSnapshot;
  summary: ResultSummary | null;
}

/** An evaluated value as shown beside its text: "1 800 kg", "3.6, 2.1, 1.4". */
export interface ShownValue {
  /** number(s) in `unit` (the field's Scenario unit, or the unit the parameter was written in) */
  value: number | number[] | string;
  unit: string;
  text: string;
}

export interface ParamSide {
  text: string;
  /** null when the text does not evaluate (then `error` says why) or the field is inactive */
  value: ShownValue | null;
  error?: string;
}

export type ParamChangeKind = "added" | "removed" | "changed" | "value";

export interface ParamChange {
  key: string;
  label: string;
  /** "value": same text, different evaluated value (a parameter it refers to changed) */
  change: ParamChangeKind;
  from: ParamSide | null;
  to: ParamSide | null;
  /** numeric delta in the `to` unit when both sides are single numbers in the same unit */
  delta: number | null;
}

export type BlockStatus = "added" | "removed" | "changed" | "unchanged";

export interface BlockDiff {
  id: string;
  kind: BlockKind;
  /** the title in B (or in A for a removed block) */
  title: string;
  status: BlockStatus;
  /** position changed relative to the other blocks (not merely shifted by an insert or delete) */
  moved: boolean;
  fromIndex: number | null;
  toIndex: number | null;
  renamed: { from: string; to: string } | null;
  params: ParamChange[];
  note: { from: string; to: string } | null;
}

export interface KpiDelta {
  key: keyof Kpi;
  label: string;
  unit: string;
  from: number | boolean | null;
  to: number | boolean | null;
  /** to − from when both are numbers */
  delta: number | null;
  /** delta / |from| when from ≠ 0 */
  relative: number | null;
}

export interface LedgerDelta {
  key: keyof Ledger;
  label: string;
  side: "supply" | "sink";
  from_j: number | null;
  to_j: number | null;
  delta_j: number | null;
}

/** One bar of the A → B waterfall: totals at both ends, one floating bar per changed sink. */
export interface WaterfallStep {
  key: string;
  label: string;
  kind: "total" | "increase" | "decrease";
  start_kwh: number;
  end_kwh: number;
  delta_kwh: number;
  order: number;
}

export interface TracePoint {
  series: TraceSeries;
  side: "A" | "B";
  time_s: number;
  value: number;
}

export interface NotebookDiff {
  from: string;
  to: string;
  meta: { name: { from: string; to: string } | null; powertrain: { from: string | null; to: string | null } | null };
  blocks: BlockDiff[];
  counts: { added: number; removed: number; moved: number; changed: number };
  kpi: KpiDelta[] | null;
  ledger: LedgerDelta[] | null;
  waterfall: WaterfallStep[] | null;
  traces: TracePoint[] | null;
}
