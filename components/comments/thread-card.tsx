"use client";
// One thread: where it is anchored, its comments, a reply box, resolve / reopen.
import { useState } from "react";
import { sinceText } from "@/components/documents/when";
import { Button } from "@/components/ui/button";
import type { ThreadJson } from "@/components/versions/api";
import { CommentForm } from "./comment-form";
import { Markup } from "./markup";
import { useThreads } from "./threads-context";

export function ThreadCard({ thread, showAnchor = false }: { thread: ThreadJson; showAnchor?: boolean }) {
  const { canWrite, canResolve, reply, resolve } = useThreads();
  const [replying, setReplying] = useState(false);
  const [busy, setBusy] = useState(false);
  const toggle = async () => {
    setBusy(true);
    try {
      await resolve(thread.id, thread.resolved === null);
    } finally {
      setBusy(false);
    }
  };
  return (
    <article id={showAnchor ? `thread-${thread.id}` : undefined} data-thread={thread.anchor.key}
      className={`rounded-control border px-3 py-2 text-sm ${thread.resolved ? "border-rule bg-paper-sunk/60" : "border-rule-strong bg-paper-raised"}`}>
      <header className="mb-1 flex flex-wrap items-center gap-2 text-xs text-muted">
        {showAnchor ? <span className="font-medium text-ink">{thread.anchor.label}</span> : null}
        <span>on v{thread.version.number}</span>
        {thread.detached ? <span className="rounded-full bg-warn-soft px-2 py-0.5 font-medium text-warn" title="The block or parameter was deleted from the document later">detached</span> : null}
        {thread.resolved ? <span className="rounded-full bg-ok-soft px-2 py-0.5 font-medium text-ok">resolved{thread.resolved.by ? ` by ${thread.resolved.by.name}` : ""}</span> : null}
      </header>
      <ol className="flex flex-col gap-2">
        {thread.comments.map((c) => (
          <li key={c.id}>
            <p className="text-xs text-muted"><span className="font-medium text-ink">{c.author?.name ?? "Former member"}</span> · <time dateTime={c.createdAt}>{sinceText(c.createdAt)}</time></p>
            <p className="mt-0.5"><Markup body={c.body} /></p>
          </li>
        ))}
      </ol>
      <div className="mt-2 flex flex-wrap gap-2">
        {canWrite && !replying ? <Button variant="ghost" className="px-2 py-1" onClick={() => setReplying(true)}>Reply</Button> : null}
        {canResolve ? <Button variant="ghost" className="px-2 py-1" disabled={busy} onClick={toggle}>{thread.resolved ? "Reopen" : "Resolve"}</Button> : null}
      </div>
      {replying ? (
        <div className="mt-2">
          <CommentForm label="Reply" submitLabel="Reply" onCancel={() => setReplying(false)} onSubmit={async (body) => { await reply(thread.id, body); setReplying(false); }} />
        </div>
      ) : null}
    </article>
  );
}
