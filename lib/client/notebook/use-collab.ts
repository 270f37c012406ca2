"use client";
// Opens the shared Y.Doc of one document: through the collaboration server when a URL is
// configured (y-websocket; the server checks the session cookie and role at the upgrade),
// else a local document (development without the server). Exposes the connection state and
// whether local edits have not yet reached the server.
import { useEffect, useState } from "react";
import * as Y from "yjs";
import { WebsocketProvider } from "y-websocket";
import { Awareness } from "y-protocols/awareness";
import type { PresenceUser } from "./presence";

export type ConnectionState = "connecting" | "connected" | "reconnecting" | "offline" | "local";

export interface Collab {
  doc: Y.Doc;
  awareness: Awareness;
  /** the first sync with the server finished (always true for a local document) */
  synced: boolean;
  connection: ConnectionState;
  /** local edits that the server has not been sent yet */
  unsynced: boolean;
}

interface Status {
  synced: boolean;
  connection: ConnectionState;
  unsynced: boolean;
}

export function useCollab(opts: { collabUrl: string | null; documentId: string; user: PresenceUser }): Collab | null {
  const { collabUrl, documentId, user } = opts;
  const [session, setSession] = useState<{ doc: Y.Doc; awareness: Awareness } | null>(null);
  const [status, setStatus] = useState<Status>({ synced: false, connection: collabUrl ? "connecting" : "local", unsynced: false });

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
    let everConnected = false;
    let unsynced = false;
    const update = () => {
      const online = typeof navigator === "undefined" || navigator.onLine;
      const connected = provider.wsconnected && provider.synced;
      if (connected) everConnected = true;
      // The browser's own offline flag wins: a socket can look open for a while after the network went.
      const connection: ConnectionState = !online ? "offline" : connected ? "connected" : everConnected ? "reconnecting" : "connecting";
      setStatus({ synced: everConnected, connection, unsynced });
    };
    const onDocUpdate = (_u: Uint8Array, origin: unknown) => {
      if (origin === provider) return;
      // Sent at once while connected and synced; otherwise held until the next sync exchange.
      const online = typeof navigator === "undefined" || navigator.onLine;
      if (!(online && provider.wsconnected && provider.synced)) { unsynced = true; update(); }
    };
    const onSync = (isSynced: boolean) => { if (isSynced) unsynced = false; update(); };
    provider.on("status", update);
    provider.on("sync", onSync);
    doc.on("update", onDocUpdate);
    // Back online with edits made meanwhile: reconnect, so the sync exchange (state vectors)
    // delivers whatever the old socket may have dropped, and the badge clears on its answer.
    const onOnline = () => {
      if (unsynced) { provider.disconnect(); provider.connect(); }
      update();
    };
    window.addEventListener("online", onOnline);
    window.addEventListener("offline", update);
    setSession({ doc, awareness: provider.awareness });
    return () => {
      window.removeEventListener("online", onOnline);
      window.removeEventListener("offline", update);
      doc.off("update", onDocUpdate);
      provider.destroy();
      doc.destroy();
    };
    // The presence user is set once per connection; a rename shows on the next visit.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [collabUrl, documentId]);

  // Warn before leaving while edits are still only in this tab.
  useEffect(() => {
    if (!status.unsynced) return;
    const warn = (event: BeforeUnloadEvent) => { event.preventDefault(); event.returnValue = ""; };
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [status.unsynced]);

  return session ? { ...session, ...status } : null;
}
