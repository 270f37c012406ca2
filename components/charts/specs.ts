// Vega-lite specs of the notebook's result views. Constants: each is embedded once and fed
// through its named datasets (see vega-view.tsx). Ours in design; no spec comes from users.
import type { VisualizationSpec } from "vega-embed";
import { CHART_CONFIG, ELECTRIC, FUEL, GROUP_DOMAIN, GROUP_RANGE, GROUP_TITLES, INK, LOSS, MUTED, ROAD } from "./theme";

/**
 * Width from the container; the layout is recalculated on every update (resize), because the
 * data arrive after the embed: computed once, the axes would keep the room of the empty chart
 * and clip labels that only the data bring (category names, longer tick labels).
 */
export const FIT_X = { type: "fit-x", contains: "padding", resize: true } as const;

/** What every chart of ours shares: schema, theme, container width with the fit above. */
export const CHART_FRAME = {
  $schema: "https://vega.github.io/schema/vega-lite/v6.json",
  config: CHART_CONFIG,
  autosize: FIT_X,
  width: "container",
} as const;

const groupColor = {
  field: "group", type: "nominal", title: null,
  scale: { domain: GROUP_DOMAIN, range: GROUP_RANGE },
  legend: { orient: "bottom", direction: "horizontal", labelExpr: `[${GROUP_TITLES.map((t) => `'${t}'`).join(",")}][indexof(${JSON.stringify(GROUP_DOMAIN)}, datum.value)]` },
} as const;

/** Loss ledger: one horizontal bar per sink, kWh, coloured by path. */
export const LEDGER_BAR_SPEC = {
  ...CHART_FRAME,
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
  ...CHART_FRAME,
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

/** Colours of the trace series; the key is drawn in HTML under each multi-series panel. */
export const SERIES_DOMAIN = ["speed", "engine", "motor", "generator", "friction brakes", "SOC", "gear"];
export const SERIES_RANGE = [INK, FUEL, ELECTRIC, ROAD, LOSS, ELECTRIC, MUTED];

/**
 * Time axis of every chart over a cycle: the data's extent (nice: false, so a 2,231 s cycle does
 * not run to 2,400 s), labels with a plain comma for thousands like the rest of the product, and
 * the outermost labels kept inside the plot so neighbours never run together.
 */
export const TIME_AXIS = { format: ",~f", labelFlush: true, labelOverlap: true } as const;
export const TIME_SCALE = { nice: false, zero: false } as const;

/**
 * Fixed width of the y axis (ticks + labels) of the trace panels, so the time axes of the
 * stacked panels line up although their tick labels differ in length.
 */
const TRACE_Y_AXIS_PX = 44;

export type TracePanelKind = "speed" | "power" | "soc" | "gear";

/**
 * One trace panel: a single view (so fit-x autosize can keep its y axis inside the figure).
 * Title and colour key are HTML around it (components/notebook/chart-views.tsx); the panels
 * stack with aligned time axes because their y axes have the same fixed width. Constant per
 * kind, fed through the dataset "rows".
 */
export function tracePanelSpec(kind: TracePanelKind, timeLabels: boolean): VisualizationSpec {
  const gear = kind === "gear";
  return {
    ...CHART_FRAME,
    height: 90,
    data: { name: "rows" },
    mark: { type: "line", strokeWidth: 1.2, interpolate: gear ? "step-after" : "linear" },
    encoding: {
      x: { field: "t", type: "quantitative", title: timeLabels ? "time (s)" : null, scale: TIME_SCALE, axis: { ...TIME_AXIS, labels: timeLabels, ticks: timeLabels } },
      y: {
        field: "value", type: "quantitative", title: null, scale: { zero: kind !== "soc" },
        axis: { tickCount: gear ? undefined : 4, tickMinStep: gear ? 1 : undefined, format: gear ? "d" : ",~f", minExtent: TRACE_Y_AXIS_PX, maxExtent: TRACE_Y_AXIS_PX },
      },
      color: { field: "series", type: "nominal", scale: { domain: SERIES_DOMAIN, range: SERIES_RANGE }, legend: null },
      tooltip: [{ field: "series" }, { field: "t", title: "t (s)", format: "," }, { field: "value", format: ".2f" }],
    },
  } as VisualizationSpec;
}

/** Engine operating points (engine on) under the full-load curve. */
export const OPERATING_POINTS_SPEC = {
  ...CHART_FRAME,
  height: 280,
  encoding: {
    // from idle to the top of the curve, not from 0 rpm, where an engine never runs
    x: { field: "speed_rpm", type: "quantitative", title: "engine speed (rpm)", scale: { zero: false }, axis: { format: ",~f" } },
    y: { field: "torque_nm", type: "quantitative", title: "engine torque (N·m)", axis: { format: ",~f" } },
  },
  layer: [
    {
      data: { name: "curve" },
      mark: { type: "line", color: INK, strokeWidth: 2, point: { filled: true, size: 24, color: INK } },
      encoding: { tooltip: [{ field: "speed_rpm", title: "rpm" }, { field: "torque_nm", title: "N·m", format: ".1f" }] },
    },
    {
      // drawn over the curve, so points at full load stay visible; area grows with the steps
      // spent at the point (a genset's fixed point is one big dot, not one small one)
      data: { name: "points" },
      mark: { type: "circle", opacity: 0.55, color: FUEL },
      encoding: {
        size: { field: "steps", type: "quantitative", scale: { type: "sqrt", range: [16, 400], zero: true }, legend: null },
        tooltip: [{ field: "speed_rpm", title: "rpm", format: "," }, { field: "torque_nm", title: "N·m" }, { field: "steps", title: "steps here" }],
      },
    },
  ],
} as VisualizationSpec;
