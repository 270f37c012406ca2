// Follows one y-websocket provider and turns its events into the connection state the notebook
// shows, and whether local edits have not reached the server yet. Kept apart from React so it
// can run against a real server in tests.
//
// A refused upgrade (HTTP 401/403/404) reaches a browser only as a failed connection (close 1006,
// no status), the same as a server that is down. So after an attempt that never opened, the watcher
// asks the app about the document (`probe`, same session cookie and rules): 401 or 403/404 end
// the connection for good; anything else (200, no answer) keeps y-websocket's reconnect backoff.
import type * as Y from "yjs";
import type { WebsocketProvider } from "y-websocket";
import { endedByCloseCode, endedByHttpStatus, type EndedState } from "./connection-end";

export type ConnectionState = "connecting" | "connected" | "reconnecting" | "offline" | "local" | EndedState;

export interface ConnectionStatus {
  synced: boolean;
  connection: ConnectionState;
  unsynced: boolean;
}

export interface WatchOptions {
  /** HTTP status of a read of the document by the app, or null when there was no answer */
  probe: () => Promise<number | null>;
  onChange: (status: ConnectionStatus) => void;
  isOnline?: () => boolean;
  /** at most one probe per interval while attempts keep failing (the server may just be down) */
  probeInterval_ms?: number;
}

export interface ConnectionWatch {
  /** the browser came back online */
  online(): void;
  /** the browser's online flag changed */
  refresh(): void;
  stop(): void;
}

export function watchConnection(provider: WebsocketProvider, doc: Y.Doc, opts: WatchOptions): ConnectionWatch {
  const isOnline = opts.isOnline ?? (() => true);
  const interval_ms = opts.probeInterval_ms ?? 10_000;
  let everConnected = false;
  let unsynced = false;
  let ended: EndedState | null = null;
  let openedThisAttempt = false;
  let lastProbe_ms = -Infinity;
  let probing = false;
  let stopped = false;

  const emit = () => {
    if (stopped) return;
    const connected = provider.wsconnected && provider.synced;
    if (connected) everConnected = true;
    // Ended wins; then the browser's own offline flag: a socket can look open for a while after the network went.
    const connection: ConnectionState = ended ?? (!isOnline() ? "offline" : connected ? "connected" : everConnected ? "reconnecting" : "connecting");
    opts.onChange({ synced: everConnected, connection, unsynced });
  };
  const end = (state: EndedState) => {
    if (ended) return;
    ended = state;
    // No further attempts (a server close already stopped them; a refusal did not). An attempt
    // in flight is left to be refused: closing a connecting socket only adds a browser warning.
    provider.shouldConnect = false;
    if (provider.wsconnected) provider.disconnect();
    emit();
  };
  const probe = async () => {
    if (probing || ended || !isOnline() || Date.now() - lastProbe_ms < interval_ms) return;
    probing = true;
    lastProbe_ms = Date.now();
    const status = await opts.probe().catch(() => null);
    probing = false;
    const state = status === null ? null : endedByHttpStatus(status);
    if (state && !stopped) end(state);
  };

  const onStatus = (event: { status: string }) => {
    if (event.status === "connected") openedThisAttempt = true;
    emit();
  };
  const onClose = (event: CloseEvent | null) => {
    const opened = openedThisAttempt;
    openedThisAttempt = false;
    if (ended || event === null) return emit(); // null: closed by us (disconnect, watchdog)
    if (endedByCloseCode(event.code)) return; // the "closed" event follows
    if (!opened) void probe();
    emit();
  };
  const onClosed = (event: { code: number }) => end(endedByCloseCode(event.code) ?? "closed");
  const onSync = (isSynced: boolean) => { if (isSynced) unsynced = false; emit(); };
  const onDocUpdate = (_u: Uint8Array, origin: unknown) => {
    if (origin === provider) return;
    // Sent at once while connected and synced; otherwise held until the next sync exchange.
    if (!(isOnline() && provider.wsconnected && provider.synced)) { unsynced = true; emit(); }
  };

  provider.on("status", onStatus);
  provider.on("connection-close", onClose);
  provider.on("closed", onClosed);
  provider.on("sync", onSync);
  doc.on("update", onDocUpdate);
  emit();

  return {
    online() {
      // Back online with edits made meanwhile: reconnect, so the sync exchange (state vectors)
      // delivers whatever the old socket may have dropped. Never after the server ended it.
      if (unsynced && !ended) { provider.disconnect(); provider.connect(); }
      emit();
    },
    refresh: emit,
    stop() {
      stopped = true;
      provider.off("status", onStatus);
      provider.off("connection-close", onClose);
      provider.off("closed", onClosed);
      provider.off("sync", onSync);
      doc.off("update", onDocUpdate);
    },
  };
}
