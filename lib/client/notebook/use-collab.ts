"use client";
// Opens the shared Y.Doc of one document: through the collaboration server when a URL is
// configured (y-websocket; the server checks the session cookie and role at the upgrade),
// else a local document (development without the server). Exposes the connection state
// (connection-watch.ts, including a connection the server ended for good) and whether local
// edits have not yet reached the server.
import { useEffect, useState } from "react";
import * as Y from "yjs";
import { WebsocketProvider } from "y-websocket";
import { Awareness } from "y-protocols/awareness";
import type { PresenceUser } from "./presence";
import { watchConnection, type ConnectionState, type ConnectionStatus } from "./connection-watch";

export type { ConnectionState } from "./connection-watch";

export interface Collab extends ConnectionStatus {
  doc: Y.Doc;
  awareness: Awareness;
  /** the first sync with the server finished (always true for a local document) */
  synced: boolean;
  connection: ConnectionState;
  /** local edits that the server has not been sent yet */
  unsynced: boolean;
}

/**
 * `accessUrl`: an app route that reads the document with the same rules as the upgrade (answers
 * 401/403/404 when the server would refuse); asked only after a connection attempt failed.
 */
export function useCollab(opts: { collabUrl: string | null; documentId: string; accessUrl: string; user: PresenceUser }): Collab | null {
  const { collabUrl, documentId, accessUrl, user } = opts;
  const [session, setSession] = useState<{ doc: Y.Doc; awareness: Awareness } | null>(null);
  const [status, setStatus] = useState<ConnectionStatus>({ synced: false, connection: collabUrl ? "connecting" : "local", unsynced: false });

  useEffect(() => {
    const doc = new Y.Doc();
    if (!collabUrl) {
      const awareness = new Awareness(doc);
      awareness.setLocalStateField("user", user);
      setSession({ doc, awareness });
      setStatus({ synced: true, connection: "local", unsynced: false });
      return () => { awareness.destroy(); doc.destroy(); };
    }
    // BroadcastChannel off: every edit goes through the server, which enforces roles.
    const provider = new WebsocketProvider(collabUrl, documentId, doc, { disableBc: true });
    provider.awareness.setLocalStateField("user", user);
    const watch = watchConnection(provider, doc, {
      probe: () => fetch(accessUrl, { credentials: "same-origin", cache: "no-store" }).then((r) => r.status, () => null),
      isOnline: () => typeof navigator === "undefined" || navigator.onLine,
      onChange: setStatus,
    });
    const onOnline = () => watch.online();
    const onOffline = () => watch.refresh();
    window.addEventListener("online", onOnline);
    window.addEventListener("offline", onOffline);
    setSession({ doc, awareness: provider.awareness });
    return () => {
      window.removeEventListener("online", onOnline);
      window.removeEventListener("offline", onOffline);
      watch.stop();
      provider.destroy();
      doc.destroy();
    };
    // The presence user is set once per connection; a rename shows on the next visit.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [collabUrl, documentId, accessUrl]);

  // Warn before leaving while edits are still only in this tab.
  useEffect(() => {
    if (!status.unsynced) return;
    const warn = (event: BeforeUnloadEvent) => { event.preventDefault(); event.returnValue = ""; };
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [status.unsynced]);

  return session ? { ...session, ...status } : null;
}
