// Vega-lite specs of the notebook's result views. Constants: each is embedded once and fed
// through its named datasets (see vega-view.tsx). Ours in design; no spec comes from users.
import type { VisualizationSpec } from "vega-embed";
import { CHART_CONFIG, ELECTRIC, FUEL, GROUP_DOMAIN, GROUP_RANGE, GROUP_TITLES, INK, LOSS, MUTED, ROAD } from "./theme";

const groupColor = {
  field: "group", type: "nominal", title: null,
  scale: { domain: GROUP_DOMAIN, range: GROUP_RANGE },
  legend: { orient: "bottom", direction: "horizontal", labelExpr: `[${GROUP_TITLES.map((t) => `'${t}'`).join(",")}][indexof(${JSON.stringify(GROUP_DOMAIN)}, datum.value)]` },
} as const;

/** Loss ledger: one horizontal bar per sink, kWh, coloured by path. */
export const LEDGER_BAR_SPEC = {
  $schema: "https://vega.github.io/schema/vega-lite/v6.json",
  config: CHART_CONFIG,
  autosize: { type: "fit-x", contains: "padding" },
  width: "container",
  height: { step: 18 },
  data: { name: "ledger" },
  transform: [{ filter: "datum.side === 'sink'" }],
  mark: { type: "bar", cornerRadiusEnd: 2 },
  encoding: {
    y: { field: "label", type: "nominal", sort: null, title: null, axis: { labelLimit: 180 } },
    x: { field: "kwh", type: "quantitative", title: "kWh over the cycle" },
    color: groupColor,
    tooltip: [{ field: "label", title: "term" }, { field: "kwh", title: "kWh", format: ".3f" }, { field: "pct", title: "% of input", format: ".1f" }],
  },
} as VisualizationSpec;

/**
 * Energy flow: two balanced stacked columns, "Energy in" and "Energy out", with each term as a
 * labelled segment. Equal heights are the ledger closing; colours follow the energy path.
 */
export const ENERGY_FLOW_SPEC = {
  $schema: "https://vega.github.io/schema/vega-lite/v6.json",
  config: CHART_CONFIG,
  autosize: { type: "fit-x", contains: "padding" },
  width: "container",
  height: 320,
  data: { name: "flow" },
  transform: [
    { joinaggregate: [{ op: "sum", field: "kwh", as: "column_kwh" }], groupby: ["column"] },
    { calculate: "datum.column_kwh > 0 ? datum.kwh / datum.column_kwh : 0", as: "share" },
  ],
  encoding: {
    x: { field: "column", type: "nominal", title: null, sort: ["Energy in", "Energy out"], axis: { labelAngle: 0, labelFontSize: 12, labelColor: INK }, scale: { paddingInner: 0.45 } },
    y: { field: "kwh", type: "quantitative", stack: "zero", title: "kWh over the cycle" },
    order: { field: "order", type: "quantitative" },
  },
  layer: [
    {
      mark: { type: "bar", stroke: "#fcfaf5", strokeWidth: 1 },
      encoding: {
        // The legend is drawn in HTML under the chart (components/charts/group-legend.tsx).
        color: { ...groupColor, legend: null },
        tooltip: [{ field: "label", title: "term" }, { field: "kwh", title: "kWh", format: ".3f" }, { field: "share", title: "share", format: ".1%" }],
      },
    },
    {
      transform: [{ filter: "datum.share >= 0.04" }],
      mark: { type: "text", color: "#fcfaf5", fontSize: 10.5, fontWeight: 600 },
      encoding: {
        y: { field: "kwh", type: "quantitative", stack: "zero", bandPosition: 0.5 },
        text: { field: "label", type: "nominal" },
      },
    },
  ],
} as VisualizationSpec;

const seriesColor = {
  field: "series", type: "nominal", title: null,
  scale: { domain: ["speed", "engine", "motor", "generator", "friction brakes", "SOC", "gear"], range: [INK, FUEL, ELECTRIC, ROAD, LOSS, ELECTRIC, MUTED] },
  legend: { orient: "bottom", direction: "horizontal" },
} as const;

export interface TracePanel {
  /** dataset name */
  id: string;
  title: string;
}

/**
 * Traces: small multiples over time, one panel per quantity, stacked with aligned time axes.
 * A vconcat (not a facet) so that the layout never depends on the data pushed later; the panel
 * list depends only on the powertrain, so the spec changes only when the powertrain does.
 */
export function tracesSpec(panels: readonly TracePanel[], legendSeries: readonly string[]): VisualizationSpec {
  return {
    $schema: "https://vega.github.io/schema/vega-lite/v6.json",
    config: CHART_CONFIG,
    autosize: { type: "fit-x", contains: "padding" },
    spacing: 14,
    resolve: { scale: { color: "shared", x: "shared" } },
    vconcat: panels.map((p, i) => ({
      data: { name: p.id },
      width: "container",
      height: 90,
      title: { text: p.title, anchor: "start", fontSize: 11, fontWeight: 600, color: INK, offset: 4 },
      mark: { type: "line", strokeWidth: 1.2, interpolate: p.id === "trace_gear" ? "step-after" : "linear" },
      encoding: {
        x: { field: "t", type: "quantitative", title: i === panels.length - 1 ? "time (s)" : null, axis: { labels: i === panels.length - 1 } },
        y: { field: "value", type: "quantitative", title: null, axis: { tickCount: 4 }, scale: { zero: p.id !== "trace_soc" } },
        color: { ...seriesColor, legend: { ...seriesColor.legend, values: legendSeries } },
      },
    })),
  } as VisualizationSpec;
}

/** Engine operating points (engine on) under the full-load curve. */
export const OPERATING_POINTS_SPEC = {
  $schema: "https://vega.github.io/schema/vega-lite/v6.json",
  config: CHART_CONFIG,
  autosize: { type: "fit-x", contains: "padding" },
  width: "container",
  height: 280,
  layer: [
    {
      data: { name: "points" },
      mark: { type: "circle", size: 14, opacity: 0.45, color: FUEL },
      encoding: {
        x: { field: "speed_rpm", type: "quantitative", title: "engine speed (rpm)" },
        y: { field: "torque_nm", type: "quantitative", title: "engine torque (N·m)" },
      },
    },
    {
      data: { name: "curve" },
      mark: { type: "line", color: INK, strokeWidth: 2, point: { filled: true, size: 24, color: INK } },
      encoding: {
        x: { field: "speed_rpm", type: "quantitative" },
        y: { field: "torque_nm", type: "quantitative" },
        tooltip: [{ field: "speed_rpm", title: "rpm" }, { field: "torque_nm", title: "N·m", format: ".1f" }],
      },
    },
  ],
} as VisualizationSpec;

