// Vega-lite specs of the strategy comparison: fuel per strategy (as burnt and SOC-corrected)
// and the SOC traces. Colours: fuel hue for burnt fuel, electric hue for the corrected share.
import type { VisualizationSpec } from "vega-embed";
import { CHART_CONFIG, ELECTRIC, FUEL, INK, LOSS, MUTED } from "@/components/charts/theme";

export const FUEL_BARS_SPEC = {
  $schema: "https://vega.github.io/schema/vega-lite/v6.json",
  config: CHART_CONFIG,
  width: "container",
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
  $schema: "https://vega.github.io/schema/vega-lite/v6.json",
  config: CHART_CONFIG,
  width: "container",
  height: 180,
  data: { name: "soc" },
  mark: { type: "line", strokeWidth: 1.5 },
  encoding: {
    x: { field: "time_s", type: "quantitative", title: "time (s)" },
    y: { field: "soc", type: "quantitative", title: "state of charge", scale: { zero: false } },
    color: { field: "strategy", type: "nominal", sort: null, scale: { range: [MUTED, LOSS, INK] }, legend: { orient: "bottom", title: null } },
    tooltip: [{ field: "strategy" }, { field: "time_s", title: "t (s)" }, { field: "soc", format: ".4f" }],
  },
} as unknown as VisualizationSpec;
