// Figures stored beside each library item, so lists never load the data.
import { recognizeCycle, referenceStats } from "@/lib/uploads";
import type { LibraryKind } from "./kinds";
import type { LibraryData } from "./preview";

export type CycleSummary = {
  kind: "cycle"; samples: number; dt_s: number; duration_s: number; distance_km: number; mean_speed_kmh: number; max_speed_kmh: number;
  stops: number; idle_share: number; mean_positive_accel_m_s2: number; has_grade: boolean; recognition: string; published_match: string | null;
};
export type FullLoadSummary = { kind: "engine_full_load"; points: number; min_speed_rpm: number; max_speed_rpm: number; max_torque_nm: number; max_power_kw: number };
export type OcvSummary = { kind: "battery_ocv"; points: number; min_voltage_v: number; max_voltage_v: number; soc_span: [number, number] };
export type LibrarySummary = CycleSummary | FullLoadSummary | OcvSummary;

export function summarize(kind: LibraryKind, data: LibraryData): LibrarySummary {
  if (kind === "cycle" && "speed_kmh" in data) {
    const s = referenceStats(data.dt_s, data.speed_kmh, data.grade_pct);
    const r = recognizeCycle(data.dt_s, data.speed_kmh);
    return {
      kind, samples: data.speed_kmh.length, dt_s: data.dt_s, duration_s: s.duration_s, distance_km: s.distance_km,
      mean_speed_kmh: s.mean_speed_kmh, max_speed_kmh: s.max_speed_kmh, stops: s.stops, idle_share: s.idle_share,
      mean_positive_accel_m_s2: s.mean_positive_accel_m_s2, has_grade: Boolean(data.grade_pct?.some((g) => g !== 0)),
      recognition: r.label, published_match: r.match,
    };
  }
  if (kind === "engine_full_load" && "torque_nm" in data) {
    // P = T·ω, ω = n·π/30
    const power = data.speed_rpm.map((n, k) => (data.torque_nm[k] * n * Math.PI) / 30 / 1000);
    return {
      kind, points: data.speed_rpm.length, min_speed_rpm: data.speed_rpm[0], max_speed_rpm: data.speed_rpm[data.speed_rpm.length - 1],
      max_torque_nm: Math.max(...data.torque_nm), max_power_kw: Math.max(...power),
    };
  }
  if (kind === "battery_ocv" && "voltage_v" in data)
    return {
      kind: "battery_ocv", points: data.soc.length, min_voltage_v: Math.min(...data.voltage_v), max_voltage_v: Math.max(...data.voltage_v),
      soc_span: [data.soc[0], data.soc[data.soc.length - 1]],
    };
  throw new Error(`library data does not fit kind ${kind}`);
}
