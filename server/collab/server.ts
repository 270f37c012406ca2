// The collaboration server: y-websocket protocol on an http server (127.0.0.1), admission at the
// upgrade (admission.ts), PostgreSQL persistence (rooms.ts), GET /health.
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import type { Duplex } from "node:stream";
import type { AddressInfo } from "node:net";
import { WebSocketServer, type WebSocket } from "ws";
import { docs, setupWSConnection } from "@y/websocket-server/utils";
import { admit, decide } from "./admission";
import { classify, toUint8Array } from "./protocol";
import { attachConnection, type Access, installPersistence, openRoom, openRoomCount, relayStats, releaseIfIdle, settleReleases } from "./rooms";
import { handleInject, isInjectRequest } from "./inject";

export type CollabServer = { port: number; close(): Promise<void> };

const STATUS_TEXT: Record<number, string> = { 401: "Unauthorized", 403: "Forbidden", 404: "Not Found", 500: "Internal Server Error" };

function refuse(socket: Duplex, status: number): void {
  if (socket.writable) socket.write(`HTTP/1.1 ${status} ${STATUS_TEXT[status] ?? "Error"}\r\nConnection: close\r\nContent-Length: 0\r\n\r\n`);
  socket.destroy();
}

let running = false;

/** Starts the server; the Yjs document map is per process, so one server per process. */
export async function startCollabServer(args: {
  port: number;
  appUrl: string;
  host?: string;
  compactThreshold?: number;
  touchInterval_ms?: number;
  /** How often open connections are re-authorized (session, membership, role, archived). */
  recheckInterval_ms?: number;
}): Promise<CollabServer> {
  if (running) throw new Error("a collaboration server is already running in this process");
  const appOrigin = new URL(args.appUrl).origin;
  installPersistence({ compactThreshold: args.compactThreshold ?? 500, touchInterval_ms: args.touchInterval_ms ?? 5000 });
  const wss = new WebSocketServer({ noServer: true, maxPayload: 16 * 1024 * 1024 });

  const http = createServer((req: IncomingMessage, res: ServerResponse) => {
    if (req.method === "GET" && req.url === "/health") {
      res.writeHead(200, { "content-type": "application/json", "cache-control": "no-store" });
      res.end(JSON.stringify({ ok: true, documents: docs.size, connections: wss.clients.size, relay: relayStats() }));
      return;
    }
    // Restores from the app (versions): an update already in PostgreSQL, relayed to connected clients.
    if (isInjectRequest(req)) return void handleInject(req, res).catch(() => res.writeHead(500).end());
    res.writeHead(404, { "content-type": "application/json" }).end(JSON.stringify({ error: "not found" }));
  });

  http.on("upgrade", (req: IncomingMessage, socket: Duplex, head: Buffer) => {
    socket.on("error", () => socket.destroy());
    void upgrade(req, socket, head).catch((error: unknown) => {
      console.error("[collab] upgrade failed:", error);
      refuse(socket, 500);
    });
  });

  // Open connections and what they were admitted with, for the periodic re-check.
  const admitted = new Map<WebSocket, { sessionId: string; documentId: string; access: Access }>();
  let rechecking = false;
  const recheck = async () => {
    if (rechecking) return;
    rechecking = true;
    try {
      for (const [conn, a] of admitted) {
        const now = await decide({ sessionId: a.sessionId, documentId: a.documentId }).catch(() => null); // database hiccup: keep as is
        if (!now) continue;
        // 4401/4403/4404: y-websocket clients treat 44xx as final and stop reconnecting.
        if (!now.ok) conn.close(4400 + (now.status % 100), now.reason);
        else a.access.writable = now.writable;
      }
    } finally {
      rechecking = false;
    }
  };
  const recheckTimer = setInterval(() => void recheck(), args.recheckInterval_ms ?? 30_000);
  recheckTimer.unref();

  async function upgrade(req: IncomingMessage, socket: Duplex, head: Buffer): Promise<void> {
    const admission = await admit(req, appOrigin);
    if (!admission.ok) return refuse(socket, admission.status);
    const name = admission.documentId;
    await openRoom(name);
    // From here on synchronous: the room cannot be released between load and join.
    if (socket.destroyed) return releaseIfIdle(name);
    wss.handleUpgrade(req, socket, head, (conn) => {
      const access: Access = { writable: admission.writable };
      admitted.set(conn, { sessionId: admission.sessionId, documentId: name, access });
      conn.on("close", () => admitted.delete(conn));
      attachConnection({
        conn, name, access,
        setup: () => setupWSConnection(conn, req, { docName: name }),
        classify: (data) => classify(toUint8Array(data)),
      });
    });
    releaseIfIdle(name); // no-op when the connection joined
  }

  await new Promise<void>((resolve, reject) => {
    http.once("error", reject);
    http.listen(args.port, args.host ?? "127.0.0.1", () => {
      http.off("error", reject);
      resolve();
    });
  });
  running = true;
  const port = (http.address() as AddressInfo).port;

  return {
    port,
    close: async () => {
      clearInterval(recheckTimer);
      for (const conn of wss.clients) conn.terminate();
      await new Promise<void>((resolve) => http.close(() => resolve()));
      // Closing connections releases their rooms; wait until every write has landed.
      const deadline = Date.now() + 10_000;
      while ((docs.size > 0 || openRoomCount() > 0) && Date.now() < deadline) await new Promise((r) => setTimeout(r, 10));
      await settleReleases();
      running = false;
    },
  };
}
