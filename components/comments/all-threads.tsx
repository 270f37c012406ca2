"use client";
// Every thread of the page, open ones first; detached threads stay readable here even when
// their block no longer exists anywhere on the page.
import { ThreadCard } from "./thread-card";
import { useThreads } from "./threads-context";

export function AllThreads() {
  const { threads } = useThreads();
  if (threads.length === 0) return <p className="text-sm text-muted">No comments yet.</p>;
  const open = threads.filter((t) => !t.resolved);
  const resolved = threads.filter((t) => t.resolved);
  return (
    <div className="flex flex-col gap-3">
      {open.map((t) => <ThreadCard key={t.id} thread={t} showAnchor />)}
      {resolved.length > 0 ? (
        <details>
          <summary className="cursor-pointer text-sm text-muted">{resolved.length} resolved</summary>
          <div className="mt-2 flex flex-col gap-3">{resolved.map((t) => <ThreadCard key={t.id} thread={t} showAnchor />)}</div>
        </details>
      ) : null}
    </div>
  );
}
