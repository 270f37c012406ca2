// Loopback endpoint through which the app hands the collaboration server an update it has
// already stored in PostgreSQL (a version restore): POST /internal/documents/<id>/update with the
// raw Yjs update as the body and the shared secret as a bearer token. When the document is open
// here, the update is applied to the shared doc, which relays it to every connected client; when
// it is not, nothing is needed (the next load reads it from PostgreSQL). Not persisted again.
import { timingSafeEqual } from "node:crypto";
import type { IncomingMessage, ServerResponse } from "node:http";
import * as Y from "yjs";
import { docs } from "@y/websocket-server/utils";
import { injectSecret } from "@/lib/versions/server/inject-secret";

const PATH = /^\/internal\/documents\/([0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12})\/update$/i;
const MAX_BYTES = 16 * 1024 * 1024;

export function isInjectRequest(req: IncomingMessage): boolean {
  return req.method === "POST" && PATH.test(req.url ?? "");
}

function authorized(req: IncomingMessage): boolean {
  const given = Buffer.from(String(req.headers.authorization ?? "").replace(/^Bearer\s+/i, ""));
  const expected = Buffer.from(injectSecret());
  return given.length === expected.length && timingSafeEqual(given, expected);
}

async function readBody(req: IncomingMessage): Promise<Uint8Array | null> {
  const chunks: Buffer[] = [];
  let total = 0;
  for await (const chunk of req) {
    total += (chunk as Buffer).length;
    if (total > MAX_BYTES) return null;
    chunks.push(chunk as Buffer);
  }
  return new Uint8Array(Buffer.concat(chunks));
}

function reply(res: ServerResponse, status: number, body: unknown): void {
  res.writeHead(status, { "content-type": "application/json", "cache-control": "no-store" }).end(JSON.stringify(body));
}

export async function handleInject(req: IncomingMessage, res: ServerResponse): Promise<void> {
  if (!authorized(req)) return reply(res, 401, { error: "unknown secret" });
  const name = PATH.exec(req.url ?? "")![1]!.toLowerCase();
  const update = await readBody(req);
  if (!update) return reply(res, 413, { error: "update too large" });
  const doc = docs.get(name);
  if (!doc) return reply(res, 200, { applied: false });
  try {
    Y.applyUpdate(doc, update, "inject");
  } catch (error) {
    console.error(`[collab] could not apply an injected update to ${name}:`, error);
    return reply(res, 422, { error: "unreadable update" });
  }
  reply(res, 200, { applied: true });
}
