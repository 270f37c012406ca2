"use client";
// The headline figures of a result: fuel, CO2, electric energy, SOC swing, feasibility.
import type { Result } from "@/lib/engine";
import { fmt } from "@/lib/client/notebook/format";
import { Cautions, WithResult } from "./result-state";
import { FindingsSummary } from "./findings-summary";
import { useEvaluationState } from "./notebook-context";

interface Figure {
  id: string;
  label: string;
  value: string;
  unit: string;
  accent: string;
  note?: string;
}

function figures(r: Result): Figure[] {
  const k = r.kpi;
  const out: Figure[] = [];
  const hasFuel = r.powertrain !== "bev";
  const hasBattery = r.powertrain !== "conventional";
  if (hasFuel) {
    out.push({ id: "fuel", label: "Fuel", value: fmt(k.fuel_l_per_100km, 2), unit: "L/100 km", accent: "border-fuel" });
    out.push({ id: "co2", label: "CO2", value: fmt(k.co2_g_per_km, 1), unit: "g/km", accent: "border-fuel", note: "tank-to-wheel" });
  }
  if (hasBattery) {
    out.push({ id: "electric", label: "Electric energy", value: fmt(k.electric_kwh_per_100km, 2), unit: "kWh/100 km", accent: "border-electric", note: "net from the battery" });
    out.push({ id: "soc", label: "SOC", value: `${fmt(k.soc_initial !== null ? 100 * k.soc_initial : null, 1)} → ${fmt(k.soc_final !== null ? 100 * k.soc_final : null, 1)}`, unit: "%", accent: "border-electric", note: "initial → final" });
  }
  out.push({
    id: "feasible", label: "Feasible", value: k.feasible ? "yes" : "no", unit: "",
    accent: k.feasible ? "border-ok" : "border-danger",
    note: k.feasible ? "every step within limits" : `${k.infeasible_steps} infeasible step${k.infeasible_steps === 1 ? "" : "s"}`,
  });
  return out;
}

export function HeadlineFigures() {
  const evaluation = useEvaluationState();
  return (
    <WithResult>
      {(r) => (
        <>
          <dl className="grid grid-cols-2 gap-3 md:grid-cols-5" data-eval-ms={evaluation.elapsed_ms?.toFixed(1)}>
            {figures(r).map((f) => (
              <div key={f.id} className={`rounded-control border-l-4 bg-paper px-3 py-2.5 ${f.accent}`}>
                <dt className="text-xs font-medium uppercase tracking-wide text-muted">{f.label}</dt>
                <dd className="mt-0.5">
                  <span className="num font-mono text-xl font-semibold text-ink" data-kpi={f.id}>{f.value}</span>
                  {f.unit ? <span className="ml-1 text-sm text-ink-soft">{f.unit}</span> : null}
                  {f.note ? <span className="block text-xs text-muted">{f.note}</span> : null}
                </dd>
              </div>
            ))}
          </dl>
          <p className="mt-3 font-mono text-xs text-muted">
            {fmt(r.kpi.distance_km, 2)} km in {fmt(r.kpi.duration_s, 0)} s
            {r.strategy ? ` · strategy ${r.strategy}` : ""} · ledger closes to {fmt(Math.abs(r.closure_error_j), 3)} J
          </p>
          <FindingsSummary result={r} />
          <div className="mt-3 border-t border-rule pt-3"><Cautions /></div>
        </>
      )}
    </WithResult>
  );
}
