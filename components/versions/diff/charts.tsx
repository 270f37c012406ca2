"use client";
// The waterfall from A's energy use to B's, and A's and B's traces overlaid, one series at a time.
import { useMemo, useState } from "react";
import { Chart } from "@/components/charts/chart";
import { TRACE_LABELS } from "@/lib/versions/labels";
import type { TracePoint, TraceSeries, WaterfallStep } from "@/lib/versions/types";
import { OVERLAY_SPEC, WATERFALL_SPEC } from "../specs";

export function Waterfall({ steps }: { steps: WaterfallStep[] }) {
  const datasets = useMemo(() => ({ steps }), [steps]);
  return <Chart spec={WATERFALL_SPEC} datasets={datasets} label="Waterfall of energy use from A to B, one bar per ledger term that changed" />;
}

export function TraceOverlay({ points }: { points: TracePoint[] }) {
  const available = useMemo(() => (Object.keys(TRACE_LABELS) as TraceSeries[]).filter((s) => points.some((p) => p.series === s && p.value !== 0)), [points]);
  const [series, setSeries] = useState<TraceSeries>(available[0] ?? "speed_kmh");
  const datasets = useMemo(() => ({ points: points.filter((p) => p.series === series) }), [points, series]);
  const meta = TRACE_LABELS[series];
  return (
    <div>
      <div role="group" aria-label="Trace" className="mb-2 flex flex-wrap gap-1">
        {available.map((s) => (
          <button key={s} type="button" aria-pressed={s === series} onClick={() => setSeries(s)}
            className={`rounded-full px-3 py-1 text-xs font-medium ${s === series ? "bg-ink text-paper-raised" : "bg-paper-sunk text-ink"}`}>
            {TRACE_LABELS[s].label}
          </button>
        ))}
      </div>
      <p className="mb-1 text-xs text-muted">{meta.label}{meta.unit ? `, ${meta.unit}` : ""} (means over a few steps each)</p>
      <Chart spec={OVERLAY_SPEC} datasets={datasets} label={`${meta.label} over time, A and B overlaid`} />
    </div>
  );
}
