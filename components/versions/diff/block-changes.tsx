"use client";
// Parameter changes block by block: added / removed / moved / renamed blocks, and for each
// parameter the old → new text with its evaluated value and unit. Parameters and blocks carry
// comment anchors.
import { Fragment, useState } from "react";
import { BLOCK_TITLES } from "@/lib/notebook/block-kinds";
import { parameterKey } from "@/lib/versions/anchors";
import type { BlockDiff, ParamChange, ParamSide } from "@/lib/versions/types";
import { AnchorPanel, AnchorToggle } from "@/components/comments/anchor-threads";
import { sameAsText, signed } from "./delta";

const STATUS: Record<BlockDiff["status"], { text: string; cls: string }> = {
  added: { text: "added", cls: "bg-ok-soft text-ok" },
  removed: { text: "removed", cls: "bg-danger-soft text-danger" },
  changed: { text: "changed", cls: "bg-warn-soft text-warn" },
  unchanged: { text: "unchanged", cls: "bg-paper-sunk text-muted" },
};

function Side({ side }: { side: ParamSide | null }) {
  if (!side) return <span className="text-muted">—</span>;
  return (
    <span className="flex flex-col">
      <code className="font-mono text-[0.85rem]">{side.text === "" ? "(empty)" : side.text}</code>
      {side.value && !sameAsText(side.text, side.value.text) ? <span className="font-mono text-xs text-muted">= {side.value.text}</span> : null}
      {side.error ? <span className="text-xs text-danger">{side.error}</span> : null}
    </span>
  );
}

function ParamRow({ blockId, p, title }: { blockId: string; p: ParamChange; title: string }) {
  const [open, setOpen] = useState(false);
  const anchor = { kind: "parameter" as const, key: parameterKey(blockId, p.key) };
  const unit = p.to?.value?.unit ?? p.from?.value?.unit ?? "";
  return (
    <Fragment>
      <tr className="border-b border-rule/60 align-top" data-param={p.key}>
        <th scope="row" className="py-1.5 pr-2 text-left font-normal">
          {p.label}
          {p.change === "value" ? <span className="block text-xs text-muted">value changed through a parameter it uses</span> : null}
          {p.change === "added" || p.change === "removed" ? <span className="block text-xs text-muted">{p.change}</span> : null}
        </th>
        <td className="px-2 py-1.5"><Side side={p.from} /></td>
        <td className="px-2 py-1.5"><Side side={p.to} /></td>
        <td className="px-2 py-1.5 text-right font-mono">{p.delta !== null ? `${signed(p.delta, Math.abs(p.delta) >= 100 ? 0 : 3)} ${unit}` : ""}</td>
        <td className="py-1.5 pl-2 text-right"><AnchorToggle anchor={anchor} label={`${title} › ${p.label}`} open={open} onToggle={() => setOpen(!open)} /></td>
      </tr>
      {open ? <tr><td colSpan={5}><AnchorPanel anchor={anchor} label={`${title} › ${p.label}`} /></td></tr> : null}
    </Fragment>
  );
}

function BlockCard({ b }: { b: BlockDiff }) {
  const [open, setOpen] = useState(false);
  const anchor = { kind: "block" as const, key: b.id };
  return (
    <section className="rounded-card border border-rule bg-paper-raised p-4" data-block-diff={b.id} data-status={b.status}>
      <header className="flex flex-wrap items-center gap-2">
        <h3 className="font-semibold">{b.title}</h3>
        {b.title !== BLOCK_TITLES[b.kind] ? <span className="text-xs text-muted">{BLOCK_TITLES[b.kind]}</span> : null}
        <span className={`rounded-full px-2 py-0.5 text-xs font-medium ${STATUS[b.status].cls}`}>{STATUS[b.status].text}</span>
        {b.moved ? <span className="rounded-full bg-electric-soft px-2 py-0.5 text-xs font-medium text-electric">moved {b.fromIndex! + 1} → {b.toIndex! + 1}</span> : null}
        <span className="ml-auto"><AnchorToggle anchor={anchor} label={b.title} open={open} onToggle={() => setOpen(!open)} /></span>
      </header>
      {b.renamed ? <p className="mt-1 text-sm">Renamed: <q>{b.renamed.from}</q> → <q>{b.renamed.to}</q></p> : null}
      {b.note ? <p className="mt-1 text-sm text-muted">Note edited.</p> : null}
      {open ? <AnchorPanel anchor={anchor} label={b.title} /> : null}
      {b.params.length > 0 ? (
        <div className="mt-2 overflow-x-auto">
          <table className="w-full border-collapse text-sm">
            <caption className="sr-only">Parameter changes in {b.title}</caption>
            <thead>
              <tr className="border-b border-rule-strong text-xs uppercase tracking-wide text-muted">
                <th scope="col" className="py-1 pr-2 text-left font-semibold">Parameter</th>
                <th scope="col" className="px-2 py-1 text-left font-semibold">A</th>
                <th scope="col" className="px-2 py-1 text-left font-semibold">B</th>
                <th scope="col" className="px-2 py-1 text-right font-semibold">Change</th>
                <th scope="col" className="py-1 pl-2"><span className="sr-only">Comments</span></th>
              </tr>
            </thead>
            <tbody>{b.params.map((p) => <ParamRow key={p.key} blockId={b.id} p={p} title={b.title} />)}</tbody>
          </table>
        </div>
      ) : null}
    </section>
  );
}

export function BlockChanges({ blocks, showUnchanged }: { blocks: BlockDiff[]; showUnchanged: boolean }) {
  const shown = showUnchanged ? blocks : blocks.filter((b) => b.status !== "unchanged" || b.moved);
  if (shown.length === 0) return <p className="text-sm text-muted">No block or parameter differs.</p>;
  return <div className="flex flex-col gap-3">{shown.map((b) => <BlockCard key={b.id} b={b} />)}</div>;
}
