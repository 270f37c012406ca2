// Charts for export, built from a Result: vega-lite specs with the data inline and a fixed size
// (no container to measure on the server). Ours in design; no spec ever comes from a request.
import type { Config, TopLevelSpec } from "vega-lite";
import { SINK_KEYS, type Result } from "@/lib/engine";
import { EXPORT_FONT_FAMILY } from "./fonts";
import { ELECTRIC, FUEL, INK, LOSS, MUTED, ROAD, RULE } from "@/components/charts/theme";

export const EXPORT_CHARTS = ["speed", "power", "soc", "ledger"] as const;
export type ExportChart = (typeof EXPORT_CHARTS)[number];

/** Inter first: the PNG rasteriser has exactly that font (lib/export/fonts.ts); an SVG opened elsewhere falls back. */
const FONT = `${EXPORT_FONT_FAMILY}, Helvetica, Arial, sans-serif`;
const CONFIG: Config = {
  background: "#fcfaf5",
  font: FONT,
  view: { stroke: null },
  axis: { labelColor: MUTED, titleColor: INK, gridColor: RULE, domainColor: RULE, tickColor: RULE, labelFontSize: 11, titleFontSize: 11, titleFontWeight: 600 },
  legend: { labelColor: INK, labelFontSize: 11 },
  title: { color: INK, fontSize: 13, anchor: "start" },
};

const WIDTH = 720;
/** Longer traces are thinned to this many points per series; the chart cannot show more. */
const MAX_POINTS = 4000;

function thin(n: number): number[] {
  const stride = Math.max(1, Math.ceil(n / MAX_POINTS));
  const out: number[] = [];
  for (let k = 0; k < n; k += stride) out.push(k);
  if (n > 0 && out[out.length - 1] !== n - 1) out.push(n - 1);
  return out;
}

function line(title: string, yTitle: string, rows: { t: number; value: number; series: string }[], colors: [string, string][]): TopLevelSpec {
  return {
    $schema: "https://vega.github.io/schema/vega-lite/v6.json",
    config: CONFIG, width: WIDTH, height: 220, title,
    data: { values: rows },
    mark: { type: "line", strokeWidth: 1.2, interpolate: "step-after" },
    encoding: {
      x: { field: "t", type: "quantitative", title: "time (s)" },
      y: { field: "value", type: "quantitative", title: yTitle },
      color: { field: "series", type: "nominal", title: null, scale: { domain: colors.map((c) => c[0]), range: colors.map((c) => c[1]) }, legend: { orient: "bottom", direction: "horizontal" } },
    },
  };
}

function series(result: Result, entries: [string, number[], number][]): { t: number; value: number; series: string }[] {
  const t = result.traces.time_s;
  const rows: { t: number; value: number; series: string }[] = [];
  for (const [name, values, scale] of entries) for (const k of thin(t.length)) rows.push({ t: t[k], value: values[k] * scale, series: name });
  return rows;
}

const LEDGER_LABELS: Record<string, string> = {
  aero: "aerodynamic drag", rolling: "rolling resistance", grade: "grade", kinetic: "kinetic energy (net)", friction_brakes: "friction brakes",
  driveline: "driveline", clutch: "clutch slip", engine: "engine", motor: "electric machine", generator: "generator",
  battery_internal: "battery internal", auxiliaries: "auxiliaries",
};

export function ledgerLabel(key: string): string {
  return LEDGER_LABELS[key] ?? key.replace(/_/g, " ");
}

export function chartSpec(chart: ExportChart, result: Result): TopLevelSpec {
  const tr = result.traces;
  if (chart === "speed") return line(`${result.name}: speed`, "speed (km/h)", series(result, [["speed", tr.speed_kmh, 1]]), [["speed", INK]]);
  if (chart === "soc") return line(`${result.name}: state of charge`, "SOC (%)", series(result, [["SOC", tr.soc, 100]]), [["SOC", ELECTRIC]]);
  if (chart === "power") {
    return line(`${result.name}: power`, "power (kW)", series(result, [
      ["wheels", tr.wheel_power_w, 1e-3], ["engine", tr.engine_power_w, 1e-3], ["motor", tr.motor_power_w, 1e-3], ["friction brakes", tr.brake_power_w, -1e-3],
    ]), [["wheels", ROAD], ["engine", FUEL], ["motor", ELECTRIC], ["friction brakes", LOSS]]);
  }
  const rows = SINK_KEYS.map((k) => ({ term: ledgerLabel(k), kwh: result.ledger_j[k] / 3.6e6 })).filter((r) => r.kwh !== 0);
  return {
    $schema: "https://vega.github.io/schema/vega-lite/v6.json",
    config: CONFIG, width: WIDTH, height: { step: 20 }, title: `${result.name}: where the energy goes (kWh over the cycle)`,
    data: { values: rows },
    mark: { type: "bar", color: LOSS },
    encoding: {
      y: { field: "term", type: "nominal", sort: null, title: null, axis: { labelLimit: 200 } },
      x: { field: "kwh", type: "quantitative", title: "kWh" },
    },
  };
}
