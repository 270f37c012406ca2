// Headline figures A, B and B − A.
import type { KpiDelta } from "@/lib/versions/types";
import { fmt } from "@/lib/client/notebook/format";
import { decimalsFor, deltaClass, percent, signed } from "./delta";

const show = (v: number | boolean | null, d: number) => (typeof v === "boolean" ? (v ? "yes" : "no") : fmt(v, d));

export function KpiTable({ rows }: { rows: KpiDelta[] }) {
  // figures that are zero on both sides (electric energy of two conventional cars) say nothing
  const visible = rows.filter((r) => (r.from !== null || r.to !== null) && !(r.from === 0 && r.to === 0 && r.key !== "infeasible_steps"));
  return (
    <table className="w-full border-collapse text-sm" data-kpi-deltas>
      <caption className="sr-only">Headline figures, A and B</caption>
      <thead>
        <tr className="border-b border-rule-strong text-xs uppercase tracking-wide text-muted">
          <th scope="col" className="py-2 pr-2 text-left font-semibold">Figure</th>
          <th scope="col" className="px-2 py-2 text-right font-semibold">A</th>
          <th scope="col" className="px-2 py-2 text-right font-semibold">B</th>
          <th scope="col" className="py-2 pl-2 text-right font-semibold">B − A</th>
        </tr>
      </thead>
      <tbody>
        {visible.map((r) => {
          const counted = r.key === "infeasible_steps" || r.key === "engine_starts";
          const d = counted ? 0 : decimalsFor(typeof r.from === "number" ? r.from : typeof r.to === "number" ? r.to : null);
          const lowerIsBetter = r.key !== "feasible" && r.key !== "soc_final";
          return (
            <tr key={r.key} className="border-b border-rule/60" data-kpi={r.key}>
              <th scope="row" className="py-1.5 pr-2 text-left font-normal">{r.label}{r.unit ? <span className="text-muted"> ({r.unit})</span> : null}</th>
              <td className="px-2 py-1.5 text-right font-mono whitespace-nowrap">{show(r.from, d)}</td>
              <td className="px-2 py-1.5 text-right font-mono whitespace-nowrap">{show(r.to, d)}</td>
              <td className={`py-1.5 pl-2 text-right font-mono ${r.key === "distance_km" || r.key === "duration_s" ? "text-muted" : deltaClass(r.delta, lowerIsBetter)}`}>
                {signed(r.delta, d)} <span className="text-xs">{percent(r.relative)}</span>
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
