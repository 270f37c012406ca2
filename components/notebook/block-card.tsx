"use client";
// One block of the notebook: header (kind, title, who is here, commands), body, note, findings.
import { memo, useEffect, useState, type KeyboardEvent } from "react";
import * as Y from "yjs";
import type { Finding } from "@/lib/engine";
import { BLOCK_TITLES, RESULT_VIEW_KINDS, duplicateBlock, moveBlock, removeBlock, setBlockProp, type BlockKind, type BlockMap, type CompileMessage } from "@/lib/notebook";
import { useBlockProps } from "@/lib/client/notebook/use-block-props";
import type { Peer } from "@/lib/client/notebook/presence";
import { BlockBody } from "./block-body";
import { BlockToolbar } from "./block-toolbar";
import { FindingsList } from "./findings-list";
import { useNotebook } from "./notebook-context";
import { TextEditor } from "./text-editor";

export interface BlockCardProps {
  id: string;
  kind: BlockKind;
  map: BlockMap;
  index: number;
  count: number;
  messages: CompileMessage[];
  findings: Finding[];
  peers: Peer[];
  /** compiled field values of this block (same object while unchanged) */
  values: Record<string, unknown> | undefined;
}

export const BlockCard = memo(function BlockCard({ id, kind, map, index, count, messages, findings, peers, values }: BlockCardProps) {
  const { doc, canEdit, focusBlock, step } = useNotebook();
  const { title, collapsed: sharedCollapsed } = useBlockProps(map, kind);
  // Read-only people cannot write the shared flag: they fold blocks for themselves only.
  const [localCollapsed, setLocalCollapsed] = useState<boolean | null>(null);
  const collapsed = canEdit ? sharedCollapsed : (localCollapsed ?? sharedCollapsed);
  const isView = RESULT_VIEW_KINDS.includes(kind);
  const blockMessages = messages.filter((m) => !m.field);
  const fieldErrors = messages.filter((m) => m.field && m.severity === "error").length;

  const move = (delta: number) => step(() => moveBlock(doc, id, index + delta));
  const onKeyDown = (event: KeyboardEvent<HTMLElement>) => {
    if (!canEdit || !event.altKey || (event.key !== "ArrowUp" && event.key !== "ArrowDown")) return;
    if ((event.target as HTMLElement).closest(".cm-editor")) return;
    event.preventDefault();
    move(event.key === "ArrowUp" ? -1 : 1);
    requestAnimationFrame(() => document.getElementById(`block-${id}`)?.focus());
  };

  return (
    <section
      id={`block-${id}`}
      tabIndex={-1}
      aria-labelledby={`block-${id}-title`}
      data-block-kind={kind}
      onFocusCapture={() => focusBlock(id)}
      onKeyDown={onKeyDown}
      className={`scroll-mt-24 rounded-card border bg-paper-raised shadow-card outline-none focus-visible:ring-2 focus-visible:ring-focus/40 ${isView ? "border-rule" : "border-rule"} ${findings.some((f) => f.severity === "infeasible") ? "border-l-4 border-l-danger" : ""}`}
    >
      <header className="flex flex-wrap items-center gap-x-3 gap-y-1 border-b border-rule/70 px-4 py-2">
        <span className={`text-[0.68rem] font-semibold uppercase tracking-wider ${isView ? "text-electric" : "text-muted"}`}>{BLOCK_TITLES[kind]}</span>
        <TitleInput id={id} title={title} canEdit={canEdit} />
        {collapsed && fieldErrors > 0 ? <span className="rounded-full bg-danger-soft px-2 text-xs text-danger">{fieldErrors} error{fieldErrors === 1 ? "" : "s"}</span> : null}
        <PeerDots peers={peers} />
        <div className="ml-auto">
          <BlockToolbar
            title={title} collapsed={collapsed} canEdit={canEdit} first={index === 0} last={index === count - 1}
            onUp={() => move(-1)} onDown={() => move(1)} onDuplicate={() => step(() => duplicateBlock(doc, id))}
            onToggle={() => (canEdit ? step(() => setBlockProp(doc, id, "collapsed", !collapsed)) : setLocalCollapsed(!collapsed))}
            onDelete={() => step(() => removeBlock(doc, id))}
          />
        </div>
      </header>
      {collapsed ? null : (
        <div className="px-4 py-3">
          <BlockBody id={id} kind={kind} map={map} messages={messages} values={values} />
          {isView ? null : <BlockNote id={id} kind={kind} map={map} />}
          <FindingsList findings={findings} messages={blockMessages} />
        </div>
      )}
    </section>
  );
});

function TitleInput({ id, title, canEdit }: { id: string; title: string; canEdit: boolean }) {
  const { doc, step } = useNotebook();
  const [draft, setDraft] = useState(title);
  useEffect(() => setDraft(title), [title]);
  if (!canEdit) return <h2 id={`block-${id}-title`} className="text-sm font-semibold">{title}</h2>;
  const commit = () => { const t = draft.trim(); if (t && t !== title) step(() => setBlockProp(doc, id, "title", t)); else setDraft(title); };
  return (
    <h2 id={`block-${id}-title`} className="min-w-0 flex-1 basis-40 text-sm font-semibold">
      <input
        aria-label="Block title" value={draft} onChange={(e) => setDraft(e.target.value)} onBlur={commit}
        onKeyDown={(e) => { if (e.key === "Enter") e.currentTarget.blur(); if (e.key === "Escape") { setDraft(title); e.currentTarget.blur(); } }}
        className="w-full rounded-control border border-transparent bg-transparent px-1 py-0.5 font-semibold hover:border-rule focus:border-focus focus:bg-paper-raised"
      />
    </h2>
  );
}

function PeerDots({ peers }: { peers: Peer[] }) {
  if (peers.length === 0) return null;
  return (
    <ul className="flex items-center gap-1" aria-label="People on this block">
      {peers.map((p) => (
        <li key={p.clientId} title={`${p.user.name}${p.self ? " (you)" : ""}`}
          className="flex h-5 items-center rounded-full px-1.5 text-[0.68rem] font-semibold text-paper-raised" style={{ backgroundColor: p.user.color }}>
          {initials(p.user.name)}
        </li>
      ))}
    </ul>
  );
}

export function initials(name: string): string {
  const parts = name.trim().split(/\s+/);
  return ((parts[0]?.[0] ?? "") + (parts.length > 1 ? parts[parts.length - 1]![0] : "")).toUpperCase();
}

function BlockNote({ id, kind, map }: { id: string; kind: BlockKind; map: BlockMap }) {
  const { awareness, undoManager, canEdit, focusBlock } = useNotebook();
  const note = map.get("note");
  const [open, setOpen] = useState(false);
  if (!(note instanceof Y.Text)) return null;
  const isNote = kind === "note";
  const hasText = note.length > 0;
  if (!isNote && !hasText && !open) {
    return canEdit ? (
      <button type="button" onClick={() => setOpen(true)} className="mt-3 text-xs font-medium text-electric underline underline-offset-2">Add a note</button>
    ) : null;
  }
  return (
    <div className={isNote ? "" : "mt-3"}>
      {isNote ? null : <p className="mb-1 text-xs font-medium text-muted">Note</p>}
      <TextEditor text={note} awareness={awareness} undoManager={undoManager} readOnly={!canEdit} multiline
        label={`Note of ${BLOCK_TITLES[kind]}`} placeholder={canEdit ? "Assumptions, sources, open questions…" : undefined}
        prose onFocus={() => focusBlock(id)} />
    </div>
  );
}
