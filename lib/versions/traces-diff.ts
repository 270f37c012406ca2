// Long-format rows for overlaying A's and B's traces (one chart per series, colour = side).
import { TRACE_SERIES, type ResultSummary, type TracePoint, type TraceSeries } from "./types";

export function overlayTraces(a: ResultSummary | null, b: ResultSummary | null, series: readonly TraceSeries[] = TRACE_SERIES): TracePoint[] {
  const out: TracePoint[] = [];
  const add = (s: ResultSummary | null, side: "A" | "B") => {
    if (!s) return;
    for (const key of series) {
      const values = s.traces.series[key] ?? [];
      s.traces.time_s.forEach((t, i) => {
        const v = values[i];
        if (typeof v === "number" && Number.isFinite(v) && Number.isFinite(t)) out.push({ series: key, side, time_s: t, value: v });
      });
    }
  };
  add(a, "A");
  add(b, "B");
  return out;
}
