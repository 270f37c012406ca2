"use client";
// Loss ledger: where every joule went (J, kWh, % of the energy put in), and the same as bars.
import { useMemo } from "react";
import type { Result } from "@/lib/engine";
import { ledgerRows, inputEnergy_j, type LedgerRow } from "@/lib/client/notebook/chart-data";
import { fmt, fmtGrouped, fmtPct } from "@/lib/client/notebook/format";
import { Chart } from "@/components/charts/chart";
import { LEDGER_BAR_SPEC } from "@/components/charts/specs";
import { WithResult } from "./result-state";

const DOT: Record<LedgerRow["group"], string> = {
  fuel: "bg-fuel", electric: "bg-electric", road: "bg-[#5d6b3a]", loss: "bg-loss", aux: "bg-warn", unmet: "bg-danger",
};

export function LossLedger() {
  return <WithResult>{(r) => <LedgerBody result={r} />}</WithResult>;
}

function LedgerBody({ result }: { result: Result }) {
  const rows = useMemo(() => ledgerRows(result), [result]);
  const datasets = useMemo(() => ({ ledger: rows }), [rows]);
  const supplies = rows.filter((r) => r.side === "supply");
  const sinks = rows.filter((r) => r.side === "sink");
  const input = inputEnergy_j(result);
  return (
    <div className="grid gap-gutter lg:grid-cols-[minmax(0,1.1fr)_minmax(0,1fr)]">
      <table className="w-full border-collapse text-sm" data-ledger>
        <caption className="sr-only">Loss ledger over the cycle</caption>
        <thead>
          <tr className="border-b border-rule-strong text-xs uppercase tracking-wide text-muted">
            <th scope="col" className="py-2 pr-2 text-left font-semibold">Term</th>
            <th scope="col" className="px-2 py-2 text-right font-semibold">J</th>
            <th scope="col" className="px-2 py-2 text-right font-semibold">kWh</th>
            <th scope="col" className="py-2 pl-2 text-right font-semibold">% of input</th>
          </tr>
        </thead>
        <tbody>
          <Section title="Supplied" rows={supplies} />
          <Section title="Where it went" rows={sinks} />
        </tbody>
        <tfoot>
          <tr className="border-t border-rule-strong">
            <th scope="row" className="py-2 pr-2 text-left font-medium">Energy put in</th>
            <td className="num px-2 py-2 text-right font-mono">{fmtGrouped(input)}</td>
            <td className="num px-2 py-2 text-right font-mono">{fmt(input / 3.6e6, 3)}</td>
            <td className="num py-2 pl-2 text-right font-mono">{input > 0 ? "100.0 %" : "—"}</td>
          </tr>
          <tr>
            <th scope="row" className="py-1 pr-2 text-left text-xs font-normal text-muted">Closure error</th>
            <td className="num px-2 py-1 text-right font-mono text-xs text-muted" colSpan={3}>{fmt(result.closure_error_j, 6)} J</td>
          </tr>
        </tfoot>
      </table>
      <Chart spec={LEDGER_BAR_SPEC} datasets={datasets} label="Bar chart of the loss ledger, kWh per term" />
    </div>
  );
}

function Section({ title, rows }: { title: string; rows: LedgerRow[] }) {
  return (
    <>
      <tr><th colSpan={4} scope="rowgroup" className="pb-1 pt-3 text-left text-xs font-semibold text-ink-soft">{title}</th></tr>
      {rows.map((r) => (
        <tr key={r.key} className="border-b border-rule/60" data-ledger-row={r.key}>
          <th scope="row" className="py-1.5 pr-2 text-left font-normal">
            <span className={`mr-2 inline-block size-2 rounded-full align-middle ${DOT[r.group]}`} aria-hidden="true" />
            {r.label}
          </th>
          <td className="num px-2 py-1.5 text-right font-mono">{fmtGrouped(r.j)}</td>
          <td className="num px-2 py-1.5 text-right font-mono">{fmt(r.kwh, 3)}</td>
          <td className="num py-1.5 pl-2 text-right font-mono">{fmtPct(r.pct)}</td>
        </tr>
      ))}
    </>
  );
}
