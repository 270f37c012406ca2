/**
 * Collaboration benchmark (issue 5 §9): 20 simulated clients (y-websocket providers in this
 * process) edit one document through the real collaboration server (a child process, as in
 * production) for 60 s on loopback. Reports propagation latency p50/p95 (each edit carries its send
 * time; measured when the other clients see it), lost updates (every client's final state and the
 * stored state must hold every edit) and the server's resident memory. Targets: p95 < 50 ms, zero lost.
 *
 *   bash scripts/with-test-db.sh node --import tsx scripts/bench/collab.ts
 *
 * Settings: BENCH_COLLAB_SECONDS (default 60), BENCH_COLLAB_CLIENTS (20), BENCH_COLLAB_RATE_HZ
 * (edits per second per client, default 5), BENCH_COLLAB_PORT (55211). Uses DATABASE_URL when set,
 * otherwise a database copied from TEST_TEMPLATE_DB (what with-test-db.sh provides), dropped at the end.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { randomBytes } from "node:crypto";
import { readFileSync } from "node:fs";
import { cpus, loadavg } from "node:os";
import { monitorEventLoopDelay } from "node:perf_hooks";
import postgres from "postgres";
import WebSocket from "ws";
import * as Y from "yjs";
import { WebsocketProvider } from "y-websocket";
import { table } from "./harness";

const SECONDS = positive("BENCH_COLLAB_SECONDS", 60);
const CLIENTS = positive("BENCH_COLLAB_CLIENTS", 20);
const RATE_HZ = positive("BENCH_COLLAB_RATE_HZ", 5);
const PORT = positive("BENCH_COLLAB_PORT", 55211);
const APP_URL = "http://127.0.0.1:3210";
const SETTLE_MS = 20_000;
const TARGET_P95_MS = 50;

function positive(name: string, fallback: number): number {
  const raw = process.env[name];
  if (!raw) return fallback;
  const v = Number(raw);
  if (!Number.isFinite(v) || v <= 0) throw new Error(`${name} must be a positive number, got "${raw}"`);
  return v;
}

type Edit = { c: number; i: number; t: number };
type Client = { index: number; doc: Y.Doc; provider: WebsocketProvider; sent: number };

async function database(): Promise<{ url: string; drop(): Promise<void> }> {
  if (process.env.DATABASE_URL) return { url: process.env.DATABASE_URL, drop: async () => {} };
  const admin = process.env.TEST_PG_ADMIN_URL;
  const template = process.env.TEST_TEMPLATE_DB;
  if (!admin || !template) throw new Error("set DATABASE_URL, or run through `bash scripts/with-test-db.sh node --import tsx scripts/bench/collab.ts`");
  const name = `jb_bench_${randomBytes(4).toString("hex")}`;
  const sql = postgres(admin, { max: 1, onnotice: () => {} });
  await sql.unsafe(`create database ${name} template ${template}`);
  const url = new URL(admin);
  url.pathname = `/${name}`;
  return {
    url: url.toString(),
    drop: async () => {
      await sql.unsafe(`drop database if exists ${name} with (force)`);
      await sql.end();
    },
  };
}

/** A workspace, one editor per client with a session, and one document from the bev template. */
async function fixture(): Promise<{ documentId: string; cookies: string[] }> {
  const { insertUser } = await import("@/db/users");
  const { createWorkspaceWithOwner } = await import("@/db/workspaces");
  const { addMembership } = await import("@/db/memberships");
  const { startSession } = await import("@/lib/auth/session");
  const { createDocumentFromDoc } = await import("@/db/document-updates");
  const { createScenarioDoc } = await import("@/lib/notebook");
  const tag = randomBytes(3).toString("hex");
  const users = [];
  for (let i = 0; i < CLIENTS; i++) users.push((await insertUser({ email: `bench-${tag}-${i}@example.com`, name: `Bench ${i}`, passwordHash: "x" }))!);
  const ws = await createWorkspaceWithOwner({ name: "Bench", ownerId: users[0]!.id });
  for (const u of users.slice(1)) await addMembership({ workspaceId: ws.id, userId: u.id, role: "editor" });
  const cookies = [];
  for (const u of users) {
    const c = await startSession(u.id);
    cookies.push(`${c.name}=${c.value}`);
  }
  const ydoc = createScenarioDoc("bev", "Bench document");
  const doc = await createDocumentFromDoc({ workspaceId: ws.id, name: "Bench document", powertrain: "bev", createdBy: users[0]!.id, ydoc });
  ydoc.destroy();
  return { documentId: doc.id, cookies };
}

async function startServer(databaseUrl: string): Promise<ChildProcess> {
  const proc = spawn(process.execPath, ["--import", "tsx", "server/collab.ts"], {
    env: { ...process.env, DATABASE_URL: databaseUrl, APP_URL, COLLAB_PORT: String(PORT) },
    stdio: ["ignore", "ignore", "inherit"],
  });
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    if (proc.exitCode !== null) throw new Error("the collaboration server exited; see above");
    if (await fetch(`http://127.0.0.1:${PORT}/health`).then((r) => r.ok, () => false)) return proc;
    await sleep(50);
  }
  proc.kill("SIGKILL");
  throw new Error(`the collaboration server did not answer on port ${PORT}`);
}

/** Resident and peak resident memory of a process, MiB (Linux /proc). */
function memory_mib(pid: number): { rss: number; peak: number } {
  const status = readFileSync(`/proc/${pid}/status`, "utf8");
  const kib = (key: string) => Number(new RegExp(`^${key}:\\s+(\\d+) kB`, "m").exec(status)?.[1] ?? NaN);
  return { rss: kib("VmRSS") / 1024, peak: kib("VmHWM") / 1024 };
}

function connect(index: number, documentId: string, cookie: string, latencies: number[]): Client {
  class BrowserLikeWebSocket extends WebSocket {
    constructor(address: string | URL, protocols?: string | string[]) {
      super(address, protocols, { headers: { cookie }, origin: APP_URL });
    }
  }
  const doc = new Y.Doc();
  const provider = new WebsocketProvider(`ws://127.0.0.1:${PORT}`, documentId, doc, {
    WebSocketPolyfill: BrowserLikeWebSocket as unknown as typeof globalThis.WebSocket,
    disableBc: true,
  });
  // A map keyed by edit: its events name the changed keys, so observing costs O(change), not
  // O(document) as an array's delta would (that cost alone skews latency in this process).
  const edits = doc.getMap<Edit>("bench");
  edits.observe((event) => {
    const now = performance.now();
    for (const key of event.keysChanged) {
      const e = edits.get(key);
      if (e && e.c !== index) latencies.push(now - e.t);
    }
  });
  return { index, doc, provider, sent: 0 };
}

function synced(c: Client): Promise<void> {
  if (c.provider.synced) return Promise.resolve();
  return new Promise((resolve) => c.provider.once("sync", () => resolve()));
}

function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]!;
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

async function editFor(clients: Client[], seconds: number): Promise<void> {
  const end = performance.now() + seconds * 1000;
  const period_ms = 1000 / RATE_HZ;
  await Promise.all(
    clients.map(async (c) => {
      await sleep(Math.random() * period_ms); // spread the clients over the period
      while (performance.now() < end) {
        const i = c.sent++;
        c.doc.getMap<Edit>("bench").set(`${c.index}:${i}`, { c: c.index, i, t: performance.now() });
        await sleep(period_ms * (0.5 + Math.random())); // jitter, mean = period
      }
    }),
  );
}

/** Waits (bounded) until every client holds every edit; returns the number of (client, edit) pairs missing. */
async function missingAfterSettle(clients: Client[], total: number): Promise<number> {
  const deadline = Date.now() + SETTLE_MS;
  const count = () => clients.reduce((n, c) => n + Math.max(0, total - c.doc.getMap("bench").size), 0);
  while (count() > 0 && Date.now() < deadline) await sleep(50);
  return count();
}

async function main(): Promise<void> {
  process.setMaxListeners(CLIENTS + 10); // each provider adds a process "exit" listener
  const db = await database();
  process.env.DATABASE_URL = db.url;
  let server: ChildProcess | undefined;
  const clients: Client[] = [];
  try {
    const { documentId, cookies } = await fixture();
    server = await startServer(db.url);
    const idle = memory_mib(server.pid!);
    const latencies: number[] = [];
    for (let i = 0; i < CLIENTS; i++) clients.push(connect(i, documentId, cookies[i]!, latencies));
    await Promise.all(clients.map(synced));
    console.log(`collab bench: ${CLIENTS} clients, ${RATE_HZ} edits/s each, ${SECONDS} s, server pid ${server.pid} on 127.0.0.1:${PORT}`);
    let peakDuring = idle.rss;
    const sampler = setInterval(() => (peakDuring = Math.max(peakDuring, memory_mib(server!.pid!).rss)), 1000);
    // The clients' own event-loop delay shows how much of the latency is this process being busy.
    const loopDelay = monitorEventLoopDelay({ resolution: 5 });
    loopDelay.enable();
    const loadBefore = loadavg()[0]!;
    await editFor(clients, SECONDS);
    loopDelay.disable();
    clearInterval(sampler);
    const loadAfter = loadavg()[0]!;
    const total = clients.reduce((n, c) => n + c.sent, 0);
    type Relay = { n: number; p50_ms: number | null; p95_ms: number | null; max_ms: number | null };
    const relay = ((await (await fetch(`http://127.0.0.1:${PORT}/health`)).json()) as { relay: Relay }).relay;
    const missingAtClients = await missingAfterSettle(clients, total);
    const busy = memory_mib(server.pid!);

    for (const c of clients) c.provider.destroy();
    // Every edit must also be stored: read the state the server persisted.
    const { loadDocumentState, countDocumentUpdates } = await import("@/db/document-updates");
    await sleep(500);
    const stored = new Y.Doc();
    Y.applyUpdate(stored, await loadDocumentState({ documentId }));
    const storedKeys = new Set(stored.getMap<Edit>("bench").keys());
    let missingInDb = 0;
    for (const c of clients) for (let i = 0; i < c.sent; i++) if (!storedKeys.has(`${c.index}:${i}`)) missingInDb++;
    const rows = await countDocumentUpdates({ documentId });

    latencies.sort((a, b) => a - b);
    const p50 = percentile(latencies, 50);
    const p95 = percentile(latencies, 95);
    const lost = missingAtClients + missingInDb;
    console.log(
      table(
        ["figure", "value", "target"],
        [
          ["edits sent", total, ""],
          ["deliveries measured", latencies.length, `${total * (CLIENTS - 1)} expected`],
          ["propagation p50 (ms)", p50.toFixed(1), ""],
          ["propagation p95 (ms)", p95.toFixed(1), `< ${TARGET_P95_MS}`],
          ["propagation p99 (ms)", percentile(latencies, 99).toFixed(1), ""],
          ["propagation max (ms)", (latencies[latencies.length - 1] ?? NaN).toFixed(1), ""],
          ["server arrival→stored+relayed p50/p95 (ms)", `${relay.p50_ms}/${relay.p95_ms}`, "server's share"],
          ["lost at clients (client×edit)", missingAtClients, "0"],
          ["lost in PostgreSQL (edits)", missingInDb, "0"],
          ["update rows left (compaction at 500)", rows, "< 500 + a batch"],
          ["server RSS idle (MiB)", idle.rss.toFixed(1), ""],
          ["server RSS max sampled (MiB)", Math.max(peakDuring, busy.rss).toFixed(1), ""],
          ["server RSS peak, VmHWM (MiB)", busy.peak.toFixed(1), ""],
          ["client process loop delay p99 (ms)", (loopDelay.percentile(99) / 1e6).toFixed(1), "small vs latency"],
          ["load average 1 min, before/after", `${loadBefore.toFixed(1)}/${loadAfter.toFixed(1)}`, `≤ ${cpus().length} cores`],
        ],
      ),
    );
    const ok = p95 < TARGET_P95_MS && lost === 0;
    console.log(ok ? "collab bench: targets met" : "collab bench: TARGETS MISSED");
    if (!ok) process.exitCode = 1;
    for (const c of clients) c.doc.destroy();
    stored.destroy();
  } finally {
    for (const c of clients) c.provider.destroy();
    if (server && server.exitCode === null) {
      const exited = new Promise((r) => server!.once("exit", r));
      server.kill("SIGTERM");
      await Promise.race([exited, sleep(5000)]);
      if (server.exitCode === null) server.kill("SIGKILL");
    }
    const { closeDb } = await import("@/db/pool");
    await closeDb();
    await db.drop();
  }
}

main().then(
  () => process.exit(),
  (error: unknown) => {
    console.error("collab bench failed:", error);
    process.exit(1);
  },
);
