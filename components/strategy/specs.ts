// Vega-lite specs of the strategy comparison: fuel per strategy (as burnt and SOC-corrected)
// and the SOC traces. Colours: fuel hue for burnt fuel, electric hue for the corrected share.
import type { VisualizationSpec } from "vega-embed";
import { ELECTRIC, FUEL } from "@/components/charts/theme";
import { CHART_FRAME, TIME_AXIS, TIME_SCALE } from "@/components/charts/specs";
import { SOC_COLORS } from "./rows";

export const FUEL_BARS_SPEC = {
  ...CHART_FRAME,
  height: { step: 18 },
  data: { name: "fuel" },
  mark: { type: "bar", cornerRadiusEnd: 2 },
  encoding: {
    y: { field: "strategy", type: "nominal", sort: null, title: null, axis: { labelLimit: 160 } },
    yOffset: { field: "measure", sort: ["burnt", "SOC-corrected"] },
    x: { field: "grams", type: "quantitative", title: "fuel over the cycle (g)" },
    color: { field: "measure", type: "nominal", scale: { domain: ["burnt", "SOC-corrected"], range: [FUEL, ELECTRIC] }, legend: { orient: "bottom", title: null } },
    tooltip: [{ field: "strategy" }, { field: "measure" }, { field: "grams", format: ".1f", title: "g" }],
  },
} as unknown as VisualizationSpec;

export const SOC_TRACES_SPEC = {
  ...CHART_FRAME,
  height: 180,
  data: { name: "soc" },
  mark: { type: "line", strokeWidth: 1.5 },
  encoding: {
    x: { field: "time_s", type: "quantitative", title: "time (s)", scale: TIME_SCALE, axis: TIME_AXIS },
    y: { field: "soc", type: "quantitative", title: "state of charge", scale: { zero: false } },
    // key in HTML under the chart (strategy-comparison.tsx), same colours in the same order
    color: { field: "strategy", type: "nominal", sort: null, scale: { range: SOC_COLORS }, legend: null },
    tooltip: [{ field: "strategy" }, { field: "time_s", title: "t (s)", format: "," }, { field: "soc", format: ".4f" }],
  },
} as unknown as VisualizationSpec;
