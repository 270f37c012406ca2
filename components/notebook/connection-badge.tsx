"use client";
// The connection to the collaboration server, in words and colour; when the server ended it for
// good, a notice that says why and what to do.
import Link from "next/link";
import { usePathname } from "next/navigation";
import type { ConnectionState } from "@/lib/client/notebook/use-collab";
import { ENDED_MESSAGES, type EndedState } from "@/lib/client/notebook/connection-end";

const ENDED_LOOK = { className: "bg-danger-soft text-danger", dot: "bg-danger" };

const LOOK: Record<ConnectionState, { text: string; className: string; dot: string }> = {
  connecting: { text: "Connecting…", className: "bg-paper-sunk text-ink-soft", dot: "bg-muted" },
  connected: { text: "Connected", className: "bg-ok-soft text-ok", dot: "bg-ok" },
  reconnecting: { text: "Reconnecting…", className: "bg-warn-soft text-warn", dot: "bg-warn" },
  offline: { text: "Offline", className: "bg-danger-soft text-danger", dot: "bg-danger" },
  local: { text: "Local only (no collaboration server)", className: "bg-paper-sunk text-ink-soft", dot: "bg-muted" },
  "session-ended": { text: "Signed out", ...ENDED_LOOK },
  "no-access": { text: "No access", ...ENDED_LOOK },
  closed: { text: "Disconnected", ...ENDED_LOOK },
};

export function isEnded(state: ConnectionState): state is EndedState {
  return state in ENDED_MESSAGES;
}

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

/** Shown under the header once the server ended the connection; edits made now stay in this tab. */
export function ConnectionEnded({ state }: { state: EndedState }) {
  const path = usePathname();
  return (
    <div role="alert" data-connection-ended={state} className="mb-gutter rounded-control border border-danger bg-danger-soft px-4 py-2.5 text-sm text-danger">
      <p className="font-medium">{ENDED_MESSAGES[state]}</p>
      <p className="mt-1 text-ink-soft">
        {state === "session-ended"
          ? <>Changes you make now are not saved. <Link href={`/sign-in?next=${encodeURIComponent(path)}`} className="font-medium text-electric underline underline-offset-2">Sign in</Link> to continue editing.</>
          : state === "no-access"
            ? <>You were removed from this workspace, or the document was deleted. <Link href="/" className="font-medium text-electric underline underline-offset-2">Go to your workspaces</Link>.</>
            : "Changes you make now are not saved."}
      </p>
    </div>
  );
}
