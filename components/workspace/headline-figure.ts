// The one figure that says most about a document at a glance, from its stored summary: energy per
// distance from the battery for a battery-electric car, fuel per distance for everything with an
// engine (hybrids are evaluated charge-sustaining, so fuel is their figure of merit).
import type { PowertrainKind } from "@/lib/notebook/block-kinds";
import { fmt } from "@/lib/client/notebook/format";

type Kpi = Partial<Record<string, number | boolean | null>>;

export function headlineFigure(powertrain: PowertrainKind, summary: { kpi: Kpi } | null): string {
  const [key, unit] = powertrain === "bev" ? ["electric_kwh_per_100km", "kWh/100 km"] : ["fuel_l_per_100km", "L/100 km"];
  const v = summary?.kpi[key];
  // No stored figure (never evaluated, or infeasible): say so rather than show a misleading zero.
  if (typeof v !== "number" || !Number.isFinite(v)) return "not evaluated yet";
  return `${fmt(v, 2)} ${unit}`;
}
