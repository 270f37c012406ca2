// The notebook's connection watcher (lib/client/notebook/connection-watch.ts) against the real
// collaboration server and route handlers: a connection the server ends for good (4401 session
// ended, 4404 membership gone: server/collab/server.ts re-check) and an upgrade it refuses (HTTP
// 401/404: server/collab/admission.ts; a client sees only close 1006, RFC 6455 §7.4.1) end in the
// state that says why, and the client stops trying to reconnect.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createDocumentFromDoc } from "@/db/document-updates";
import { deleteMembership, addMembership } from "@/db/memberships";
import { endSession, SESSION_COOKIE_NAME } from "@/lib/auth/session";
import { createScenarioDoc } from "@/lib/notebook";
import { watchConnection, type ConnectionState, type ConnectionWatch } from "@/lib/client/notebook/connection-watch";
import { startCollabServer, type CollabServer } from "@/server/collab/server";
import * as documentRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/route";
import { connectClient, whenSynced, type CollabClient } from "./support/collab";
import { APP, call } from "./support/http";
import { newUser, teamWorkspace } from "./support/users";

const RECHECK_MS = 100;
let server: CollabServer;
let team: Awaited<ReturnType<typeof teamWorkspace>>;
const cleanup: (() => void)[] = [];

beforeAll(async () => {
  server = await startCollabServer({ port: 0, appUrl: APP, touchInterval_ms: 0, recheckInterval_ms: RECHECK_MS });
  team = await teamWorkspace();
});
afterAll(async () => {
  for (const f of cleanup) f();
  await server.close();
});

async function newDocument(): Promise<string> {
  const ydoc = createScenarioDoc("bev", "Van study");
  const row = await createDocumentFromDoc({ workspaceId: team.workspaceId, name: "Van study", powertrain: "bev", createdBy: team.owner.id, ydoc });
  ydoc.destroy();
  return row.id;
}

/** A client as the browser runs it: provider + watcher whose probe reads the document through the app. */
function watched(documentId: string, cookie: string): { client: CollabClient; watch: ConnectionWatch; until(state: ConnectionState): Promise<void>; probes: () => number } {
  const client = connectClient({ url: `ws://127.0.0.1:${server.port}`, documentId, cookie });
  let current: ConnectionState = "connecting";
  let probes = 0;
  const waiters: (() => void)[] = [];
  const watch = watchConnection(client.provider, client.doc, {
    probe: async () => {
      probes++;
      const res = await call(documentRoute.GET, "GET", "/", { cookie, params: { workspaceId: team.workspaceId, documentId } });
      return res.status;
    },
    onChange: (s) => { current = s.connection; for (const w of waiters.splice(0)) w(); },
    probeInterval_ms: 0,
  });
  cleanup.push(() => { watch.stop(); client.close(); });
  const until = (state: ConnectionState) => new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`state stayed ${current}, expected ${state}`)), 10_000);
    const check = () => { if (current === state) { clearTimeout(timer); resolve(); } else waiters.push(check); };
    check();
  });
  return { client, watch, until, probes: () => probes };
}

/** No new connection attempt for a while (y-websocket's backoff starts at 200 ms, RECHECK_MS 100). */
async function expectNoMoreAttempts(client: CollabClient): Promise<void> {
  await new Promise((r) => setTimeout(r, 1000));
  expect(client.provider.shouldConnect).toBe(false);
  expect(client.provider.ws).toBeNull();
}

const sessionIdOf = (cookie: string) => cookie.slice(SESSION_COOKIE_NAME.length + 1);

describe("connections the collaboration server ends for good", () => {
  it("session ended while open: 4401 → session-ended, no reconnect", async () => {
    const id = await newDocument();
    const user = await newUser("leaving");
    await addMembership({ workspaceId: team.workspaceId, userId: user.id, role: "editor" });
    const w = watched(id, user.cookie);
    await whenSynced(w.client);
    await w.until("connected");
    const closed = new Promise<number>((resolve) => w.client.provider.on("connection-close", (e) => resolve(e?.code ?? 0)));
    await endSession(sessionIdOf(user.cookie));
    expect(await closed).toBe(4401);
    await w.until("session-ended");
    expect(w.probes()).toBe(0);
    await expectNoMoreAttempts(w.client);
  });

  it("membership removed while open: 4404 → no-access", async () => {
    const id = await newDocument();
    const user = await newUser("removed");
    await addMembership({ workspaceId: team.workspaceId, userId: user.id, role: "viewer" });
    const w = watched(id, user.cookie);
    await w.until("connected");
    await deleteMembership({ workspaceId: team.workspaceId, userId: user.id });
    await w.until("no-access");
    await expectNoMoreAttempts(w.client);
  });

  it("upgrade refused with 401 (signed out): the app's 401 → session-ended, attempts stop", async () => {
    const id = await newDocument();
    const user = await newUser("signedout");
    await addMembership({ workspaceId: team.workspaceId, userId: user.id, role: "editor" });
    await endSession(sessionIdOf(user.cookie));
    const w = watched(id, user.cookie);
    await w.until("session-ended");
    expect(w.probes()).toBeGreaterThanOrEqual(1);
    await expectNoMoreAttempts(w.client);
  });

  it("upgrade refused with 404 (not a member): the app's 404 → no-access", async () => {
    const id = await newDocument();
    const w = watched(id, team.outsider.cookie);
    await w.until("no-access");
    await expectNoMoreAttempts(w.client);
  });

  it("a member's connection is not ended (control)", async () => {
    const id = await newDocument();
    const w = watched(id, team.editor.cookie);
    await w.until("connected");
    expect(w.probes()).toBe(0);
    expect(w.client.provider.shouldConnect).toBe(true);
  });
});
