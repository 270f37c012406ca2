"use client";
// Preview of an upload before it is saved: speed over time, torque over speed, or OCV over SOC.
import { useMemo } from "react";
import type { VisualizationSpec } from "vega-embed";
import { Chart } from "@/components/charts/chart";
import { ELECTRIC, FUEL, INK } from "@/components/charts/theme";
import { CHART_FRAME, TIME_AXIS, TIME_SCALE } from "@/components/charts/specs";
import type { LibraryData } from "@/lib/library/preview";

const spec = (x: string, y: string, xTitle: string, yTitle: string, color: string, points: boolean): VisualizationSpec => ({
  ...CHART_FRAME, height: 200, data: { name: "rows" },
  mark: { type: "line", color, strokeWidth: 1.2, point: points ? { filled: true, size: 20, color } : false },
  encoding: {
    // a cycle's time axis like every chart over time: the data's extent, plain-comma thousands
    x: { field: x, type: "quantitative", title: xTitle, ...(x === "t" ? { scale: TIME_SCALE, axis: TIME_AXIS } : {}) },
    y: { field: y, type: "quantitative", title: yTitle },
  },
} as VisualizationSpec);

const SPECS = {
  cycle: spec("t", "v", "time (s)", "speed (km/h)", INK, false),
  engine_full_load: spec("n", "T", "engine speed (rpm)", "full-load torque (N·m)", FUEL, true),
  battery_ocv: spec("soc", "u", "SOC (%)", "open-circuit voltage (V)", ELECTRIC, true),
};

/** At most this many points are drawn (every k-th sample); the statistics use all of them. */
const MAX_POINTS = 3000;

function rows(data: LibraryData): { kind: keyof typeof SPECS; rows: object[] } {
  if ("speed_kmh" in data) {
    const stride = Math.max(1, Math.ceil(data.speed_kmh.length / MAX_POINTS));
    const out: object[] = [];
    for (let k = 0; k < data.speed_kmh.length; k += stride) out.push({ t: k * data.dt_s, v: data.speed_kmh[k] });
    return { kind: "cycle", rows: out };
  }
  if ("torque_nm" in data) return { kind: "engine_full_load", rows: data.speed_rpm.map((n, k) => ({ n, T: data.torque_nm[k] })) };
  return { kind: "battery_ocv", rows: data.soc.map((s, k) => ({ soc: s * 100, u: data.voltage_v[k] })) };
}

export function PreviewChart({ data }: { data: LibraryData }) {
  const r = useMemo(() => rows(data), [data]);
  const datasets = useMemo(() => ({ rows: r.rows }), [r]);
  return <Chart spec={SPECS[r.kind]} datasets={datasets} label="Preview of the uploaded table" />;
}
