"use client";
// Ledger deltas row by row (J and kWh), each row a comment anchor.
import { Fragment, useState } from "react";
import type { LedgerDelta } from "@/lib/versions/types";
import { fmtGrouped } from "@/lib/client/notebook/format";
import { AnchorPanel, AnchorToggle } from "@/components/comments/anchor-threads";
import { deltaClass, signed } from "./delta";

function Row({ r }: { r: LedgerDelta }) {
  const [open, setOpen] = useState(false);
  const anchor = { kind: "ledger_row" as const, key: r.key };
  const label = `Loss ledger › ${r.label}`;
  return (
    <Fragment>
      <tr className="border-b border-rule/60" data-ledger-row={r.key}>
        <th scope="row" className="py-1.5 pr-2 text-left font-normal">{r.label}</th>
        <td className="px-2 py-1.5 text-right font-mono whitespace-nowrap">{fmtGrouped(r.from_j)}</td>
        <td className="px-2 py-1.5 text-right font-mono whitespace-nowrap">{fmtGrouped(r.to_j)}</td>
        <td className={`px-2 py-1.5 text-right font-mono whitespace-nowrap ${r.side === "sink" ? deltaClass(r.delta_j === null ? null : Math.round(r.delta_j)) : ""}`}>{r.delta_j === null ? "—" : (r.delta_j > 0 ? "+" : "") + fmtGrouped(r.delta_j)}</td>
        <td className="px-2 py-1.5 text-right font-mono whitespace-nowrap">{signed(r.delta_j === null ? null : r.delta_j / 3.6e6, 4)}</td>
        <td className="py-1.5 pl-2 text-right"><AnchorToggle anchor={anchor} label={label} open={open} onToggle={() => setOpen(!open)} /></td>
      </tr>
      {open ? <tr><td colSpan={6}><AnchorPanel anchor={anchor} label={label} /></td></tr> : null}
    </Fragment>
  );
}

export function LedgerDeltaTable({ rows }: { rows: LedgerDelta[] }) {
  const visible = rows.filter((r) => (r.from_j ?? 0) !== 0 || (r.to_j ?? 0) !== 0);
  const section = (side: LedgerDelta["side"], title: string) => (
    <>
      <tr><th colSpan={6} scope="rowgroup" className="pt-3 pb-1 text-left text-xs font-semibold uppercase tracking-wide text-muted">{title}</th></tr>
      {visible.filter((r) => r.side === side).map((r) => <Row key={r.key} r={r} />)}
    </>
  );
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm" data-ledger-deltas>
        <caption className="sr-only">Loss ledger, A and B, row by row</caption>
        <thead>
          <tr className="border-b border-rule-strong text-xs uppercase tracking-wide text-muted">
            <th scope="col" className="py-2 pr-2 text-left font-semibold">Term</th>
            <th scope="col" className="px-2 py-2 text-right font-semibold">A, J</th>
            <th scope="col" className="px-2 py-2 text-right font-semibold">B, J</th>
            <th scope="col" className="px-2 py-2 text-right font-semibold">B − A, J</th>
            <th scope="col" className="px-2 py-2 text-right font-semibold">B − A, kWh</th>
            <th scope="col" className="py-2 pl-2"><span className="sr-only">Comments</span></th>
          </tr>
        </thead>
        <tbody>
          {section("supply", "Supplied")}
          {section("sink", "Where it went")}
        </tbody>
      </table>
    </div>
  );
}
