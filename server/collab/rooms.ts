// One room per open document: the shared Y.Doc of @y/websocket-server, loaded from PostgreSQL
// before its first sync, and a write pipeline that appends every accepted update to
// document_updates BEFORE applying it to the shared doc (applying is what relays it to the other
// clients). So an update that any client has received is in PostgreSQL, even if the process is
// killed the next moment. Rooms are released (doc destroyed, removed from `docs`) when the last
// client leaves; a reopened document waits until the previous instance's writes are done.
import * as Y from "yjs";
import type { WebSocket } from "ws";
import { docs, getYDoc, setPersistence, type WSSharedDoc } from "@y/websocket-server/utils";
import { appendDocumentUpdates, compactDocumentUpdates, loadDocumentStateWithCount } from "@/db/document-updates";
import { touchDocument } from "@/db/documents";

export type RoomOptions = {
  /** Update rows of one document that trigger compaction into its snapshot. */
  compactThreshold: number;
  /** documents.updated_at is written at most this often per document while edits arrive. */
  touchInterval_ms: number;
};

type Pending = { conn: WebSocket; update: Uint8Array; arrived_ms: number };

type Room = {
  name: string;
  doc: WSSharedDoc;
  loaded: Promise<void>;
  isLoaded: boolean;
  queue: Pending[];
  running: Promise<void> | null;
  compaction: Promise<void> | null;
  updateCount: number;
  lastTouch_ms: number;
  dirty: boolean;
  pendingUpgrades: number;
};

// Enough to amortise one INSERT over a burst, small enough to keep one statement short.
const MAX_BATCH = 200;

const rooms = new Map<string, Room>();
const releasing = new Map<string, Promise<void>>();
let options: RoomOptions = { compactThreshold: 500, touchInterval_ms: 5000 };

const log = (what: string, error: unknown) => console.error(`[collab] ${what}:`, error);

export function installPersistence(opts: RoomOptions): void {
  options = opts;
  setPersistence({
    provider: null,
    bindState: (name, doc) => bind(name, doc),
    writeState: (name, doc) => release(name, doc),
  });
}

function bind(name: string, doc: WSSharedDoc): void {
  const room: Room = {
    name, doc, isLoaded: false, queue: [], running: null, compaction: null, updateCount: 0,
    lastTouch_ms: 0, dirty: false, pendingUpgrades: 0, loaded: Promise.resolve(),
  };
  room.loaded = (async () => {
    await releasing.get(name); // the previous instance's last writes must be readable first
    const { state, updateCount } = await loadDocumentStateWithCount({ documentId: name });
    Y.applyUpdate(doc, state);
    room.updateCount = updateCount;
    room.isLoaded = true;
  })();
  room.loaded.catch((error: unknown) => {
    log(`could not load document ${name}`, error);
    if (docs.get(name) === doc) docs.delete(name);
    if (rooms.get(name) === room) rooms.delete(name);
    doc.destroy();
  });
  rooms.set(name, room);
}

/** The loaded shared doc of a document; call attach() in the same tick, before any await. */
export async function openRoom(name: string): Promise<WSSharedDoc> {
  for (let attempt = 0; attempt < 5; attempt++) {
    const doc = getYDoc(name);
    const room = rooms.get(name);
    if (!room || room.doc !== doc) throw new Error(`room ${name} has no persistence binding`);
    room.pendingUpgrades++;
    try {
      await room.loaded;
    } finally {
      room.pendingUpgrades--;
    }
    // The last client may have left while we waited: then this doc is gone; open a fresh one.
    if (docs.get(name) === doc && room.isLoaded) return doc;
  }
  throw new Error(`document ${name} was released repeatedly while opening`);
}

/** Releases a loaded room that no connection joined (an upgrade that failed after openRoom). */
export function releaseIfIdle(name: string): void {
  const room = rooms.get(name);
  if (!room || room.doc.conns.size > 0 || room.pendingUpgrades > 0 || docs.get(name) !== room.doc) return;
  docs.delete(name);
  void release(name, room.doc).then(() => room.doc.destroy());
}

function release(name: string, doc: WSSharedDoc): Promise<void> {
  const room = rooms.get(name);
  if (!room || room.doc !== doc) return Promise.resolve();
  rooms.delete(name);
  const done = (async () => {
    await drain(room);
    if (room.dirty) await touchDocument({ documentId: name }).catch((e: unknown) => log(`touch ${name}`, e));
  })().catch((e: unknown) => log(`release ${name}`, e));
  releasing.set(name, done);
  void done.finally(() => {
    if (releasing.get(name) === done) releasing.delete(name);
  });
  return done;
}

async function drain(room: Room): Promise<void> {
  while (room.running || room.compaction) {
    await room.running;
    await room.compaction;
  }
}

/**
 * Hands the connection to @y/websocket-server's setupWSConnection and takes over its message
 * listener: sync step 2 and update messages (the two that change the document) go through the
 * write pipeline, or are dropped for read-only connections; step 1 and awareness go to the stock
 * listener unchanged.
 */
/** Mutable, so that a periodic re-check can make an open connection read-only (or writable). */
export type Access = { writable: boolean };

export function attachConnection(args: {
  conn: WebSocket;
  name: string;
  access: Access;
  setup: () => void;
  classify: (data: ArrayBuffer) => { kind: "write"; update: Uint8Array } | { kind: "pass" | "other" };
}): void {
  args.setup();
  const room = rooms.get(args.name);
  const stock = args.conn.listeners("message") as ((data: ArrayBuffer) => void)[];
  args.conn.removeAllListeners("message");
  args.conn.on("message", (data: ArrayBuffer) => {
    let message;
    try {
      message = args.classify(data);
    } catch {
      args.conn.close(1003, "unreadable message");
      return;
    }
    if (message.kind !== "write") {
      for (const listener of stock) listener(data);
    } else if (args.access.writable && room) {
      enqueue(room, args.conn, message.update);
    }
    // Read-only: dropped, and never persisted.
  });
}

function enqueue(room: Room, conn: WebSocket, update: Uint8Array): void {
  room.queue.push({ conn, update, arrived_ms: performance.now() });
  room.running ??= run(room);
}

async function run(room: Room): Promise<void> {
  try {
    while (room.queue.length > 0) await processBatch(room, room.queue.splice(0, MAX_BATCH));
  } finally {
    room.running = null;
  }
}

const isEmptyUpdate = (u: Uint8Array) => u.length === 2 && u[0] === 0 && u[1] === 0;

async function processBatch(room: Room, batch: Pending[]): Promise<void> {
  // Store only what the shared doc does not have yet (a reconnecting client's step 2 repeats a lot).
  const stateVector = Y.encodeStateVector(room.doc);
  const rows: Uint8Array[] = [];
  const accepted: Pending[] = [];
  for (const item of batch) {
    try {
      const diff = Y.diffUpdate(item.update, stateVector);
      if (!isEmptyUpdate(diff)) rows.push(diff);
      accepted.push(item);
    } catch (error) {
      log(`unreadable update for ${room.name}, closing its connection`, error);
      item.conn.close(1003, "unreadable update");
    }
  }
  try {
    await appendDocumentUpdates({ documentId: room.name, updates: rows });
  } catch (error) {
    // Not stored → not applied, not relayed. The clients reconnect and send it again (step 2).
    log(`could not store ${rows.length} update(s) of ${room.name}`, error);
    for (const item of accepted) item.conn.close(1011, "could not store the edit");
    return;
  }
  for (const item of accepted) {
    try {
      Y.applyUpdate(room.doc, item.update, item.conn);
    } catch (error) {
      log(`could not apply an update to ${room.name}`, error);
    }
    recordRelay(performance.now() - item.arrived_ms);
  }
  if (rows.length === 0) return;
  room.updateCount += rows.length;
  room.dirty = true;
  maybeTouch(room);
  maybeCompact(room);
}

function maybeTouch(room: Room): void {
  const now = Date.now();
  if (now - room.lastTouch_ms < options.touchInterval_ms) return;
  room.lastTouch_ms = now;
  room.dirty = false;
  void touchDocument({ documentId: room.name }).catch((e: unknown) => log(`touch ${room.name}`, e));
}

function maybeCompact(room: Room): void {
  if (room.compaction || room.updateCount < options.compactThreshold) return;
  room.compaction = compactDocumentUpdates({ documentId: room.name })
    .then((folded) => {
      room.updateCount = Math.max(0, room.updateCount - folded);
    })
    .catch((e: unknown) => log(`compact ${room.name}`, e))
    .finally(() => {
      room.compaction = null;
    });
}

// Arrival → stored and relayed, per update: the server's own share of the propagation latency.
const relaySamples_ms = new Float64Array(10_000);
let relayCount = 0;
function recordRelay(ms: number): void {
  relaySamples_ms[relayCount++ % relaySamples_ms.length] = ms;
}

/** Percentiles of the last 10 000 arrival → relay times (ms), for GET /health and the benchmark. */
export function relayStats(): { n: number; p50_ms: number | null; p95_ms: number | null; max_ms: number | null } {
  const n = Math.min(relayCount, relaySamples_ms.length);
  if (n === 0) return { n: 0, p50_ms: null, p95_ms: null, max_ms: null };
  const sorted = Array.from(relaySamples_ms.subarray(0, n)).sort((a, b) => a - b);
  const at = (p: number) => Math.round(sorted[Math.min(n - 1, Math.floor(p * n))]! * 10) / 10;
  return { n: relayCount, p50_ms: at(0.5), p95_ms: at(0.95), max_ms: at(1) };
}

/** Waits until every room released so far has finished writing (shutdown, tests). */
export async function settleReleases(): Promise<void> {
  while (releasing.size > 0) await Promise.all([...releasing.values()]);
}

export function openRoomCount(): number {
  return rooms.size;
}
