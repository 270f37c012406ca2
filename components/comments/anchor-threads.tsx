"use client";
// The threads on one anchor (a block, a parameter or a ledger row) and a way to start one.
import { useState } from "react";
import type { Anchor } from "@/lib/versions/anchors";
import { CommentForm } from "./comment-form";
import { ThreadCard } from "./thread-card";
import { useThreads } from "./threads-context";

const sameAnchor = (a: Anchor, b: Anchor) => a.kind === b.kind && a.key === b.key;

export function useAnchorThreads(anchor: Anchor) {
  const { threads } = useThreads();
  return threads.filter((t) => sameAnchor(t.anchor, anchor));
}

/** A small toggle button ("Comment", "2 comments") for a table cell or a header. */
export function AnchorToggle({ anchor, label, open, onToggle }: { anchor: Anchor; label: string; open: boolean; onToggle(): void }) {
  const { canWrite } = useThreads();
  const threads = useAnchorThreads(anchor);
  const openCount = threads.filter((t) => !t.resolved).length;
  if (!canWrite && threads.length === 0) return null;
  const text = threads.length === 0 ? "Comment" : `${threads.length} thread${threads.length === 1 ? "" : "s"}${openCount > 0 ? ` (${openCount} open)` : ""}`;
  return (
    <button type="button" onClick={onToggle} aria-expanded={open}
      className={`rounded-control px-2 py-0.5 text-xs font-medium ${openCount > 0 ? "bg-fuel-soft text-fuel" : "text-muted hover:bg-paper-sunk"}`}>
      {text}<span className="sr-only"> on {label}</span>
    </button>
  );
}

/** The expanded threads of an anchor, with the form for a new one. */
export function AnchorPanel({ anchor, label }: { anchor: Anchor; label: string }) {
  const { canWrite, create } = useThreads();
  const threads = useAnchorThreads(anchor);
  const [adding, setAdding] = useState(threads.length === 0);
  return (
    <div className="flex flex-col gap-2 py-2" aria-label={`Comments on ${label}`}>
      {threads.map((t) => <ThreadCard key={t.id} thread={t} />)}
      {canWrite && adding ? (
        <CommentForm label={`New comment on ${label}`} submitLabel="Comment" onCancel={threads.length > 0 ? () => setAdding(false) : undefined}
          onSubmit={async (body) => { await create(anchor, body); setAdding(false); }} />
      ) : canWrite ? (
        <button type="button" className="self-start text-sm underline" onClick={() => setAdding(true)}>Start another thread</button>
      ) : null}
    </div>
  );
}
