// The headline figures shown next to a version in lists.
import type { Kpi } from "@/lib/engine/result";
import { fmt } from "@/lib/client/notebook/format";

export function headline(kpi: Kpi | null): { label: string; value: string }[] {
  if (!kpi) return [];
  const out: { label: string; value: string }[] = [];
  if (kpi.fuel_l > 0) out.push({ label: "fuel", value: `${fmt(kpi.fuel_l_per_100km, 2)} L/100 km` }, { label: "CO2", value: `${fmt(kpi.co2_g_per_km, 1)} g/km` });
  if (kpi.electric_kwh_per_100km !== null && kpi.soc_final !== null) out.push({ label: "electric", value: `${fmt(kpi.electric_kwh_per_100km, 2)} kWh/100 km` });
  if (!kpi.feasible) out.push({ label: "infeasible", value: `${kpi.infeasible_steps} steps` });
  return out;
}
