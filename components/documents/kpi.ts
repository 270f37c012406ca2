// Which headline figure the documents table shows and sorts by.
import type { DocumentRow, SummaryKpiKey } from "@/lib/client/notebook/documents-api";
import { fmt } from "@/lib/client/notebook/format";

export const KPI_CHOICES: { key: SummaryKpiKey; label: string; unit: string; decimals: number }[] = [
  { key: "fuel_l_per_100km", label: "Fuel", unit: "L/100 km", decimals: 2 },
  { key: "co2_g_per_km", label: "CO2", unit: "g/km", decimals: 1 },
  { key: "electric_kwh_per_100km", label: "Electric energy", unit: "kWh/100 km", decimals: 2 },
];

/** The figure that matters most for a powertrain when no column is chosen (for the subtitle). */
export function kpiCell(row: DocumentRow, key: SummaryKpiKey): string {
  const choice = KPI_CHOICES.find((c) => c.key === key)!;
  // Not applicable rather than a misleading zero: no fuel without an engine, no traction battery in a conventional car.
  if (row.powertrain === "bev" && (key === "fuel_l_per_100km" || key === "co2_g_per_km")) return "no engine";
  if (row.powertrain === "conventional" && key === "electric_kwh_per_100km") return "no battery";
  const v = row.summary?.kpi[key];
  if (typeof v !== "number" || !Number.isFinite(v)) return "—";
  return `${fmt(v, choice.decimals)} ${choice.unit}`;
}
