// Names and units of the figures a diff compares. Ledger labels are the notebook's own.
import type { Kpi } from "@/lib/engine";
export { LEDGER_LABELS } from "@/lib/client/notebook/chart-data";

export const KPI_ROWS: readonly { key: keyof Kpi; label: string; unit: string }[] = [
  { key: "fuel_l_per_100km", label: "Fuel consumption", unit: "L/100 km" },
  { key: "co2_g_per_km", label: "CO2", unit: "g/km" },
  { key: "electric_kwh_per_100km", label: "Electric energy", unit: "kWh/100 km" },
  { key: "fuel_l", label: "Fuel over the cycle", unit: "L" },
  { key: "battery_net_kwh", label: "Battery, net", unit: "kWh" },
  { key: "soc_final", label: "Final SOC", unit: "" },
  { key: "max_c_rate", label: "Highest C-rate", unit: "C" },
  { key: "engine_starts", label: "Engine starts", unit: "" },
  { key: "infeasible_steps", label: "Infeasible steps", unit: "" },
  { key: "feasible", label: "Feasible", unit: "" },
  { key: "distance_km", label: "Distance", unit: "km" },
  { key: "duration_s", label: "Duration", unit: "s" },
];

export const TRACE_LABELS = {
  speed_kmh: { label: "Speed", unit: "km/h" },
  soc: { label: "State of charge", unit: "" },
  fuel_rate_g_s: { label: "Fuel rate", unit: "g/s" },
  battery_power_w: { label: "Battery power", unit: "W" },
  engine_power_w: { label: "Engine power", unit: "W" },
  motor_power_w: { label: "Motor power", unit: "W" },
  brake_power_w: { label: "Friction brake power", unit: "W" },
} as const;
