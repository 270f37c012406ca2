// Vega-lite specs of the diff page: the A → B waterfall of energy use and overlaid traces.
// Constants, fed through named datasets; ours in design.
import type { VisualizationSpec } from "vega-embed";
import { ELECTRIC, FUEL, INK, LOSS, OK } from "@/components/charts/theme";
import { CHART_FRAME, TIME_AXIS, TIME_SCALE } from "@/components/charts/specs";

export const WATERFALL_SPEC = {
  ...CHART_FRAME,
  height: 260,
  data: { name: "steps" },
  encoding: {
    x: { field: "label", type: "nominal", sort: { field: "order" }, title: null, axis: { labelAngle: -30, labelLimit: 140 } },
  },
  layer: [
    {
      mark: { type: "bar", cornerRadius: 2 },
      encoding: {
        y: { field: "start_kwh", type: "quantitative", title: "kWh over the cycle", scale: { zero: false } },
        y2: { field: "end_kwh" },
        color: {
          field: "kind", type: "nominal", title: null,
          scale: { domain: ["total", "increase", "decrease"], range: [INK, LOSS, OK] },
          legend: { orient: "bottom", direction: "horizontal", labelExpr: "datum.value === 'total' ? 'total energy used' : datum.value === 'increase' ? 'more in B' : 'less in B'" },
        },
        tooltip: [{ field: "label", title: "term" }, { field: "delta_kwh", title: "change, kWh", format: "+.4f" }, { field: "end_kwh", title: "running total, kWh", format: ".4f" }],
      },
    },
  ],
} as VisualizationSpec;

export const OVERLAY_SPEC = {
  ...CHART_FRAME,
  height: 200,
  data: { name: "points" },
  mark: { type: "line", strokeWidth: 1.4, interpolate: "step-after" },
  encoding: {
    x: { field: "time_s", type: "quantitative", title: "time (s)", scale: TIME_SCALE, axis: TIME_AXIS },
    y: { field: "value", type: "quantitative", title: null },
    color: { field: "side", type: "nominal", title: null, scale: { domain: ["A", "B"], range: [ELECTRIC, FUEL] }, legend: { orient: "top", labelExpr: "datum.value === 'A' ? 'A (from)' : 'B (to)'" } },
    strokeDash: { field: "side", type: "nominal", scale: { domain: ["A", "B"], range: [[1, 0], [5, 3]] }, legend: null },
  },
} as VisualizationSpec;
