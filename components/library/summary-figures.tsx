import type { LibrarySummary } from "@/lib/library/summary";

const f = (x: number, d: number) => x.toLocaleString("en-GB", { minimumFractionDigits: d, maximumFractionDigits: d });

/** The figures of an upload or a saved item, as label/value pairs. */
export function summaryPairs(s: LibrarySummary): [string, string][] {
  if (s.kind === "cycle")
    return [
      ["duration", `${f(s.duration_s, 0)} s`], ["distance", `${f(s.distance_km, 3)} km`], ["mean speed", `${f(s.mean_speed_kmh, 1)} km/h`],
      ["top speed", `${f(s.max_speed_kmh, 1)} km/h`], ["stops", String(s.stops)], ["standing", `${f(s.idle_share * 100, 1)} %`],
      ["mean acceleration", `${f(s.mean_positive_accel_m_s2, 2)} m/s²`], ["step", `${f(s.dt_s, 3)} s (${s.samples} samples)`],
      ["grade", s.has_grade ? "yes" : "level"],
    ];
  if (s.kind === "engine_full_load")
    return [["points", String(s.points)], ["speed range", `${f(s.min_speed_rpm, 0)}–${f(s.max_speed_rpm, 0)} rpm`], ["peak torque", `${f(s.max_torque_nm, 1)} N·m`], ["peak power", `${f(s.max_power_kw, 1)} kW`]];
  return [["points", String(s.points)], ["SOC span", `${f(s.soc_span[0] * 100, 0)}–${f(s.soc_span[1] * 100, 0)} %`], ["voltage range", `${f(s.min_voltage_v, 1)}–${f(s.max_voltage_v, 1)} V`]];
}

export function SummaryFigures({ summary }: { summary: LibrarySummary }) {
  return (
    <dl className="grid grid-cols-2 gap-x-4 gap-y-1 text-sm sm:grid-cols-3">
      {summaryPairs(summary).map(([k, v]) => (
        <div key={k} className="flex justify-between gap-2 border-b border-rule py-1">
          <dt className="text-muted">{k}</dt>
          <dd className="font-mono">{v}</dd>
        </div>
      ))}
    </dl>
  );
}
