// Traces as CSV: one row per interval, a header with units, comma-separated, '.' decimals,
// numbers written in full (shortest round-trip form) so that re-reading gives the same doubles.
import type { Result, Traces } from "@/lib/engine";

/** Column order and header text; keys of Traces that are not listed are appended by name. */
const COLUMNS: [keyof Traces, string][] = [
  ["time_s", "time [s]"], ["speed_kmh", "speed [km/h]"], ["gear", "gear [-]"],
  ["wheel_power_w", "wheel power [W]"], ["brake_power_w", "friction brake power [W]"],
  ["engine_on", "engine on [0/1]"], ["engine_power_w", "engine power [W]"], ["engine_speed_rpm", "engine speed [rpm]"],
  ["engine_torque_nm", "engine torque [N·m]"], ["fuel_rate_g_s", "fuel rate [g/s]"],
  ["motor_power_w", "motor power [W]"], ["motor_torque_nm", "motor torque [N·m]"], ["generator_power_w", "generator power [W]"],
  ["battery_power_w", "battery power [W]"], ["battery_current_a", "battery current [A]"], ["soc", "SOC [-]"],
];

const quote = (s: string) => (/[",\n\r]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s);

export function tracesCsv(result: Result): string {
  const traces = result.traces as unknown as Record<string, number[]>;
  const known = new Set<string>(COLUMNS.map(([k]) => k));
  const cols: [string, string][] = [...COLUMNS.filter(([k]) => Array.isArray(traces[k])), ...Object.keys(traces).filter((k) => !known.has(k) && Array.isArray(traces[k])).map((k) => [k, k] as [string, string])];
  const n = traces.time_s?.length ?? 0;
  const lines = [
    `# ${result.name} — ${result.powertrain}; one row per interval of ${result.cycle.dt_s} s; time is the interval start`,
    cols.map(([, h]) => quote(h)).join(","),
  ];
  for (let k = 0; k < n; k++) lines.push(cols.map(([key]) => String(traces[key][k] ?? "")).join(","));
  return lines.join("\n") + "\n";
}
