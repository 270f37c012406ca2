// Result → what a version stores of it. Traces are thinned to bucket means so that a power
// trace keeps its energy (Σ mean·steps = Σ samples) and a stored version stays small.
import type { Result } from "@/lib/engine";
import { TRACE_SERIES, type ResultSummary, type TraceSeries, type TraceSubset } from "./types";

export const TRACE_BUDGET_POINTS = 400;

const finiteOr0 = (x: number): number => (Number.isFinite(x) ? x : 0);

/** Means of consecutive buckets of `size` samples (the last may be shorter). */
export function bucketMeans(values: readonly number[], size: number): number[] {
  const out: number[] = [];
  for (let start = 0; start < values.length; start += size) {
    const end = Math.min(values.length, start + size);
    let sum = 0;
    for (let i = start; i < end; i++) sum += finiteOr0(values[i]!);
    out.push(sum / (end - start));
  }
  return out;
}

export function bucketSize(steps: number, budget = TRACE_BUDGET_POINTS): number {
  return Math.max(1, Math.ceil(steps / Math.max(1, budget)));
}

export function thinTraces(traces: Result["traces"], budget = TRACE_BUDGET_POINTS): TraceSubset {
  const steps = traces.time_s.length;
  const size = bucketSize(steps, budget);
  const time_s: number[] = [];
  for (let i = 0; i < steps; i += size) time_s.push(finiteOr0(traces.time_s[i]!));
  const series = {} as Record<TraceSeries, number[]>;
  for (const key of TRACE_SERIES) {
    const values = traces[key] ?? [];
    series[key] = values.length === steps ? bucketMeans(values, size) : time_s.map(() => 0);
  }
  return { time_s, series, steps_total: steps };
}

export function summarizeResult(result: Result, budget = TRACE_BUDGET_POINTS): ResultSummary {
  return {
    kpi: result.kpi,
    ledger_j: result.ledger_j,
    closure_error_j: result.closure_error_j,
    strategy: result.strategy,
    traces: thinTraces(result.traces, budget),
  };
}
