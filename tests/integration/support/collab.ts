// Node clients for the collaboration server: y-websocket's WebsocketProvider over a `ws` subclass
// that sends the session cookie and an Origin header, as a browser would.
import WebSocket from "ws";
import * as Y from "yjs";
import { WebsocketProvider } from "y-websocket";
import { APP } from "./http";

export type CollabClient = { doc: Y.Doc; provider: WebsocketProvider; close(): void };

export function connectClient(args: { url: string; documentId: string; cookie?: string | null; origin?: string; connect?: boolean }): CollabClient {
  const headers: Record<string, string> = {};
  if (args.cookie) headers.cookie = args.cookie;
  const origin = args.origin ?? APP;
  class BrowserLikeWebSocket extends WebSocket {
    constructor(address: string | URL, protocols?: string | string[]) {
      super(address, protocols, { headers, origin });
    }
  }
  const doc = new Y.Doc();
  const provider = new WebsocketProvider(args.url, args.documentId, doc, {
    WebSocketPolyfill: BrowserLikeWebSocket as unknown as typeof globalThis.WebSocket,
    disableBc: true,
    connect: args.connect ?? true,
  });
  return {
    doc,
    provider,
    close() {
      provider.destroy();
      doc.destroy(); // or the awareness timer keeps the process alive
    },
  };
}

export function whenSynced(client: CollabClient, timeout_ms = 10_000): Promise<void> {
  if (client.provider.synced) return Promise.resolve();
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error("client did not sync in time")), timeout_ms);
    const onSync = (synced: boolean) => {
      if (!synced) return;
      clearTimeout(timer);
      client.provider.off("sync", onSync);
      resolve();
    };
    client.provider.on("sync", onSync);
  });
}

/** Resolves when `predicate(doc)` holds, re-checked after every update of the doc. */
export function waitFor(doc: Y.Doc, predicate: (doc: Y.Doc) => boolean, what: string, timeout_ms = 10_000): Promise<void> {
  if (predicate(doc)) return Promise.resolve();
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => {
      doc.off("update", check);
      reject(new Error(`timed out waiting for ${what}`));
    }, timeout_ms);
    const check = () => {
      if (!predicate(doc)) return;
      clearTimeout(timer);
      doc.off("update", check);
      resolve();
    };
    doc.on("update", check);
  });
}

/**
 * The status of a raw upgrade attempt: 101 when accepted, otherwise the HTTP status the server
 * answered; `messages` counts websocket messages received (sync must not start when refused).
 */
export function tryUpgrade(args: { url: string; cookie?: string | null; origin?: string | null }): Promise<{ status: number; messages: number }> {
  const headers: Record<string, string> = {};
  if (args.cookie) headers.cookie = args.cookie;
  const ws = new WebSocket(args.url, { headers, ...(args.origin === null ? {} : { origin: args.origin ?? APP }) });
  let messages = 0;
  let answered = false;
  ws.on("message", () => messages++);
  return new Promise((resolve, reject) => {
    ws.on("unexpected-response", (req, res) => {
      answered = true;
      const status = res.statusCode ?? 0;
      res.resume();
      req.destroy();
      setTimeout(() => resolve({ status, messages }), 50);
    });
    ws.on("open", () => {
      // Give the server a moment to send its sync step 1, then report.
      setTimeout(() => {
        ws.close();
        resolve({ status: 101, messages });
      }, 200);
    });
    ws.on("error", (e) => {
      if (!answered) reject(e);
    });
  });
}

export { freePort } from "./ports";
