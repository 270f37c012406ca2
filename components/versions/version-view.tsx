"use client";
// A saved version, read-only: its blocks with every parameter's text and value, and its loss
// ledger; blocks, parameters and ledger rows carry comment threads.
import { Fragment, useState } from "react";
import { BLOCK_TITLES, type BlockKind } from "@/lib/notebook/block-kinds";
import { parameterKey, type Anchor } from "@/lib/versions/anchors";
import { fmt, fmtGrouped } from "@/lib/client/notebook/format";
import { sameAsText } from "./diff/delta";
import { AnchorPanel, AnchorToggle } from "@/components/comments/anchor-threads";

export interface ViewParam { key: string; label: string; text: string; value: string | null; error?: string }
export interface ViewBlock { id: string; kind: BlockKind; title: string; note: string; params: ViewParam[] }
export interface ViewLedgerRow { key: string; label: string; side: "supply" | "sink"; j: number }

function Anchored({ anchor, label, children, cols }: { anchor: Anchor; label: string; children: React.ReactNode; cols: number }) {
  const [open, setOpen] = useState(false);
  return (
    <Fragment>
      <tr className="border-b border-rule/60 align-top">
        {children}
        <td className="py-1.5 pl-2 text-right"><AnchorToggle anchor={anchor} label={label} open={open} onToggle={() => setOpen(!open)} /></td>
      </tr>
      {open ? <tr><td colSpan={cols}><AnchorPanel anchor={anchor} label={label} /></td></tr> : null}
    </Fragment>
  );
}

function BlockView({ b }: { b: ViewBlock }) {
  const [open, setOpen] = useState(false);
  const anchor = { kind: "block" as const, key: b.id };
  return (
    <section className="rounded-card border border-rule bg-paper-raised p-4" data-block={b.id}>
      <header className="flex flex-wrap items-center gap-2">
        <h3 className="font-semibold">{b.title}</h3>
        {b.title !== BLOCK_TITLES[b.kind] ? <span className="text-xs text-muted">{BLOCK_TITLES[b.kind]}</span> : null}
        <span className="ml-auto"><AnchorToggle anchor={anchor} label={b.title} open={open} onToggle={() => setOpen(!open)} /></span>
      </header>
      {b.note ? <p className="mt-1 whitespace-pre-wrap text-sm text-ink-soft">{b.note}</p> : null}
      {open ? <AnchorPanel anchor={anchor} label={b.title} /> : null}
      {b.params.length > 0 ? (
        <table className="mt-2 w-full border-collapse text-sm">
          <caption className="sr-only">Parameters of {b.title}</caption>
          <tbody>
            {b.params.map((p) => (
              <Anchored key={p.key} anchor={{ kind: "parameter", key: parameterKey(b.id, p.key) }} label={`${b.title} › ${p.label}`} cols={3}>
                <th scope="row" className="w-1/3 py-1.5 pr-2 text-left font-normal">{p.label}</th>
                <td className="py-1.5">
                  <code className="font-mono text-[0.85rem]">{p.text || "(empty)"}</code>
                  {p.value && !sameAsText(p.text, p.value) ? <span className="ml-2 font-mono text-xs text-muted">= {p.value}</span> : null}
                  {p.error ? <span className="block text-xs text-danger">{p.error}</span> : null}
                </td>
              </Anchored>
            ))}
          </tbody>
        </table>
      ) : null}
    </section>
  );
}

export function VersionBlocks({ blocks }: { blocks: ViewBlock[] }) {
  return <div className="flex flex-col gap-3">{blocks.map((b) => <BlockView key={b.id} b={b} />)}</div>;
}

export function VersionLedger({ rows }: { rows: ViewLedgerRow[] }) {
  const visible = rows.filter((r) => r.j !== 0);
  return (
    <table className="w-full border-collapse text-sm" data-version-ledger>
      <caption className="sr-only">Loss ledger of this version</caption>
      <thead>
        <tr className="border-b border-rule-strong text-xs uppercase tracking-wide text-muted">
          <th scope="col" className="py-2 pr-2 text-left font-semibold">Term</th>
          <th scope="col" className="px-2 py-2 text-right font-semibold">J</th>
          <th scope="col" className="px-2 py-2 text-right font-semibold">kWh</th>
          <th scope="col" className="py-2 pl-2"><span className="sr-only">Comments</span></th>
        </tr>
      </thead>
      <tbody>
        {visible.map((r) => (
          <Anchored key={r.key} anchor={{ kind: "ledger_row", key: r.key }} label={`Loss ledger › ${r.label}`} cols={4}>
            <th scope="row" className="py-1.5 pr-2 text-left font-normal" data-ledger-row={r.key}>{r.label}{r.side === "supply" ? <span className="text-xs text-muted"> (supplied)</span> : null}</th>
            <td className="px-2 py-1.5 text-right font-mono whitespace-nowrap">{fmtGrouped(r.j)}</td>
            <td className="px-2 py-1.5 text-right font-mono">{fmt(r.j / 3.6e6, 4)}</td>
          </Anchored>
        ))}
      </tbody>
    </table>
  );
}
