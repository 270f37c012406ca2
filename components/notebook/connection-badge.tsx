"use client";
// The connection to the collaboration server, in words and colour.
import type { ConnectionState } from "@/lib/client/notebook/use-collab";

const LOOK: Record<ConnectionState, { text: string; className: string; dot: string }> = {
  connecting: { text: "Connecting…", className: "bg-paper-sunk text-ink-soft", dot: "bg-muted" },
  connected: { text: "Connected", className: "bg-ok-soft text-ok", dot: "bg-ok" },
  reconnecting: { text: "Reconnecting…", className: "bg-warn-soft text-warn", dot: "bg-warn" },
  offline: { text: "Offline", className: "bg-danger-soft text-danger", dot: "bg-danger" },
  local: { text: "Local only (no collaboration server)", className: "bg-paper-sunk text-ink-soft", dot: "bg-muted" },
};

export function ConnectionBadge({ state, unsynced }: { state: ConnectionState; unsynced: boolean }) {
  const look = LOOK[state];
  const extra = unsynced && state !== "connected" ? " — edits not yet saved" : "";
  return (
    <span role="status" data-connection={state} data-unsynced={unsynced || undefined}
      className={`inline-flex items-center gap-1.5 rounded-full px-2.5 py-0.5 text-xs font-medium ${look.className}`}>
      <span className={`size-2 rounded-full ${look.dot}`} aria-hidden="true" />
      {look.text}{extra}
    </span>
  );
}
