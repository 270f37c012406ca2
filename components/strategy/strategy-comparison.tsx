"use client";
// The strategy comparison (rule or thermostat vs ECMS vs DP on one scenario): a table of the
// figures engineers compare, fuel bars and SOC traces. Renders a finished Comparison; see
// strategy-comparison-runner.tsx for running one.
import { useMemo } from "react";
import type { Comparison, StrategyFigures } from "@/lib/engine/strategies/compare";
import { Chart } from "@/components/charts/chart";
import { FUEL_BARS_SPEC, SOC_TRACES_SPEC } from "./specs";
import { fuelRows, signed, socRows, SOC_COLORS } from "./rows";
import { ColorKey } from "@/components/charts/color-key";

const num = (x: number, digits = 1) => x.toLocaleString("en-GB", { minimumFractionDigits: digits, maximumFractionDigits: digits });

// Time in each operating region; "electric" is also the time of electric drive (one column, not two).
const REGIONS: { key: keyof StrategyFigures["regions_s"]; title: string }[] = [
  { key: "electric_s", title: "electric" },
  { key: "engine_only_s", title: "engine only" },
  { key: "engine_assist_s", title: "engine + assist" },
  { key: "engine_charging_s", title: "engine charging" },
  { key: "regenerating_s", title: "braking / regen." },
  { key: "standstill_s", title: "standstill" },
];

function Row({ s }: { s: StrategyFigures }) {
  return (
    <tr className="border-t border-rule">
      <th scope="row" className="whitespace-nowrap py-1.5 pr-3 text-left font-medium">{s.label}</th>
      <td className="whitespace-nowrap px-2 text-right font-mono">{num(s.fuel_g)}</td>
      <td className="whitespace-nowrap px-2 text-right font-mono">{num(s.fuel_corrected_g)}</td>
      <td className="whitespace-nowrap px-2 text-right font-mono">{s.kind === "dp" ? "—" : `${signed(s.gap_to_dp_pct)}\u00a0%`}</td>
      <td className="whitespace-nowrap px-2 text-right font-mono">{num(s.soc_final, 4)}</td>
      <td className="whitespace-nowrap px-2 text-right font-mono">{s.engine_starts}</td>
      {REGIONS.map((r) => <td key={r.key} className="whitespace-nowrap px-2 text-right font-mono">{num(s.regions_s[r.key], 0)}</td>)}
      <td className="pl-2 text-right">{s.feasible ? "yes" : `no (${s.infeasible_steps})`}</td>
    </tr>
  );
}

/**
 * A strategy "below" the DP lower bound. DP's grid check (lib/engine/strategies/dp/findings.ts)
 * warns when a coarser grid moves the fuel by more than 1 %; without that warning a smaller
 * negative gap is within DP's grid error.
 */
function BelowDp({ s, socPoints }: { s: StrategyFigures; socPoints: number }) {
  const gap = -s.gap_to_dp_pct;
  return gap < 1 ? (
    <li>{s.label} comes out {num(gap, 2)} % below DP: within DP&apos;s grid error ({socPoints} SOC points; its grid check flags 1 % or more), not a better strategy.</li>
  ) : (
    <li className="text-warn">{s.label} comes out {num(gap, 2)} % below DP, more than DP&apos;s grid error should allow: check the DP window and findings.</li>
  );
}

export function StrategyComparison({ comparison: c }: { comparison: Comparison }) {
  const fuel = useMemo(() => ({ fuel: fuelRows(c) }), [c]);
  const soc = useMemo(() => ({ soc: socRows(c) }), [c]);
  return (
    <div className="space-y-4">
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <caption className="mb-2 text-left text-muted">
            {c.name}: {num(c.distance_km, 2)} km in {num(c.duration_s, 0)} s. Fuel in grams; SOC-corrected with η = {num(c.correction.efficiency, 3)} (see notes); times in seconds; the operating-region columns split the cycle ("electric" is the time of electric drive).
          </caption>
          <thead>
            <tr className="text-xs text-muted">
              <th scope="col" className="pb-1 text-left font-medium">strategy</th>
              <th scope="col" className="whitespace-nowrap px-2 text-right font-medium">fuel</th>
              <th scope="col" className="whitespace-nowrap px-2 text-right font-medium">SOC-corrected</th>
              <th scope="col" className="whitespace-nowrap px-2 text-right font-medium">gap to DP</th>
              <th scope="col" className="whitespace-nowrap px-2 text-right font-medium">final SOC</th>
              <th scope="col" className="whitespace-nowrap px-2 text-right font-medium">engine starts</th>
              {REGIONS.map((r) => <th key={r.key} scope="col" className="px-2 text-right font-medium" title="seconds in this operating region">{r.title}</th>)}
              <th scope="col" className="pl-2 text-right font-medium">feasible</th>
            </tr>
          </thead>
          <tbody>{c.strategies.map((s) => <Row key={s.kind} s={s} />)}</tbody>
        </table>
      </div>
      <Chart spec={FUEL_BARS_SPEC} datasets={fuel} label="Fuel per strategy, burnt and SOC-corrected" />
      <div>
        <Chart spec={SOC_TRACES_SPEC} datasets={soc} label="State of charge over the cycle for each strategy" />
        <ColorKey items={c.strategies.map((s, i) => ({ label: s.label, color: SOC_COLORS[i % SOC_COLORS.length]! }))} label="Colour key: state of charge per strategy" />
      </div>
      <ul className="list-disc space-y-1 pl-5 text-xs text-muted">
        <li>ECMS uses the equivalence factor {num(c.ecms.equivalence_factor, 3)} found by bisection for a charge-sustaining cycle{c.ecms.charge_sustaining ? "" : " (none found: the closest is shown)"}.</li>
        <li>DP: {c.dp.soc_points} SOC points × {c.dp.control_points} controls, final SOC {num(c.dp.soc_final_min, 4)}–{num(c.dp.soc_final_max, 4)}; it knows the whole cycle, so it is the lower bound up to grid error.</li>
        {c.strategies.filter((s) => s.kind !== "dp" && s.gap_to_dp_pct < 0).map((s) => <BelowDp key={s.kind} s={s} socPoints={c.dp.soc_points} />)}
        <li>Correction: {c.correction.method}.</li>
        {c.findings.map((f, i) => <li key={i} className={f.severity === "infeasible" ? "text-danger" : ""}>{f.message}</li>)}
      </ul>
    </div>
  );
}
