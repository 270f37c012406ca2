// The collaboration server in-process, with real PostgreSQL and y-websocket clients (issue 5 §4, §8):
// convergence, read-only roles (including the sync-step-2 path after a reconnect), admission at the
// upgrade, persistence before relay, compaction, and memory released when the last client leaves.
// Expected behaviour comes from the product rules (DESIGN §1: reviewers and viewers never edit;
// non-members learn nothing) and the y-websocket protocol (y-protocols/sync: step 1, step 2, update).
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as Y from "yjs";
import { docs } from "@y/websocket-server/utils";
import { countDocumentSnapshots, countDocumentUpdates, createDocumentFromDoc, loadDocumentState } from "@/db/document-updates";
import { getDocument, setDocumentArchived } from "@/db/documents";
import { createScenarioDoc, insertBlock, readDoc, setParam, blocksOf } from "@/lib/notebook";
import { startCollabServer, type CollabServer } from "@/server/collab/server";
import * as documentRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/route";
import { connectClient, tryUpgrade, waitFor, whenSynced, type CollabClient } from "./support/collab";
import { APP, call } from "./support/http";
import { newUser, teamWorkspace } from "./support/users";
import { addMembership, deleteMembership, setMembershipRole } from "@/db/memberships";

const COMPACT_THRESHOLD = 25;
const RECHECK_MS = 100;
let server: CollabServer;
let url: string;
let team: Awaited<ReturnType<typeof teamWorkspace>>;
const open: CollabClient[] = [];

beforeAll(async () => {
  server = await startCollabServer({ port: 0, appUrl: APP, compactThreshold: COMPACT_THRESHOLD, touchInterval_ms: 0, recheckInterval_ms: RECHECK_MS });
  url = `ws://127.0.0.1:${server.port}`;
  team = await teamWorkspace();
});

afterAll(async () => {
  for (const c of open) c.close();
  await server.close();
});

async function newDocument(name = "Van study"): Promise<string> {
  const ydoc = createScenarioDoc("bev", name);
  const row = await createDocumentFromDoc({ workspaceId: team.workspaceId, name, powertrain: "bev", createdBy: team.owner.id, ydoc });
  ydoc.destroy();
  return row.id;
}

async function client(documentId: string, cookie: string): Promise<CollabClient> {
  const c = connectClient({ url, documentId, cookie });
  open.push(c);
  await whenSynced(c);
  return c;
}

function close(...clients: CollabClient[]): void {
  for (const c of clients) {
    c.close();
    open.splice(open.indexOf(c), 1);
  }
}

/**
 * Everything the server accepted before this call has been stored and relayed once `observer`
 * sees the marker: the writer's marker goes through the same per-document queue (first in, first
 * out) and the server relays in order on each connection.
 */
async function barrier(writer: CollabClient, observer: CollabClient): Promise<void> {
  const key = Math.random().toString(36).slice(2);
  writer.doc.getMap("barrier").set(key, true);
  await waitFor(observer.doc, (d) => d.getMap("barrier").has(key), `barrier ${key}`);
}

/**
 * Everything `from` sent before this call has been handled by the server (a dropped write would
 * otherwise have been queued before the barrier that follows): `from` sends an awareness state
 * after its writes on the same connection, and the server handles one connection's messages in order.
 */
async function processed(from: CollabClient, editor: CollabClient): Promise<void> {
  const key = Math.random().toString(36).slice(2);
  from.provider.awareness.setLocalStateField("probe", key);
  const seen = () => [...editor.provider.awareness.getStates().values()].some((s) => s.probe === key);
  await new Promise<void>((resolve, reject) => {
    if (seen()) return resolve();
    const timer = setTimeout(() => reject(new Error("awareness probe not relayed")), 10_000);
    const onChange = () => {
      if (!seen()) return;
      clearTimeout(timer);
      editor.provider.awareness.off("change", onChange);
      resolve();
    };
    editor.provider.awareness.on("change", onChange);
  });
}

async function storedDoc(documentId: string): Promise<Y.Doc> {
  const d = new Y.Doc();
  Y.applyUpdate(d, await loadDocumentState({ documentId }));
  return d;
}


describe("collaboration server", () => {
  it("sends the stored document on the first sync (loaded from PostgreSQL before sync)", async () => {
    const id = await newDocument("Loaded first");
    const a = await client(id, team.viewer.cookie);
    // The template of lib/notebook: meta name and its blocks arrive with the first sync.
    expect(readDoc(a.doc).name).toBe("Loaded first");
    expect(readDoc(a.doc).powertrain).toBe("bev");
    expect(blocksOf(a.doc).length).toBeGreaterThan(5);
    close(a);
  });

  it("two editors converge, and what they see is stored", async () => {
    const id = await newDocument();
    const [a, b] = await Promise.all([client(id, team.editor.cookie), client(id, team.owner.cookie)]);
    const blockA = insertBlock(a.doc, "note", 0, { note: "from A" });
    const blockB = insertBlock(b.doc, "parameters", 0, { params: { payload: "500 kg" } });
    await waitFor(a.doc, (d) => readDoc(d).blocks.some((x) => x.id === blockB), "B's block at A");
    await waitFor(b.doc, (d) => readDoc(d).blocks.some((x) => x.id === blockA), "A's block at B");
    // Concurrent edits of one parameter: both clients end with the same text (CRDT convergence).
    setParam(a.doc, blockB, "payload", "650 kg");
    setParam(b.doc, blockB, "payload", "700 kg");
    await barrier(a, b);
    await barrier(b, a);
    expect(readDoc(a.doc)).toEqual(readDoc(b.doc));
    const stored = await storedDoc(id);
    expect(readDoc(stored)).toEqual(readDoc(a.doc));
    close(a, b);
  });

  it("drops a reviewer's and a viewer's writes: never relayed, never stored", async () => {
    const id = await newDocument();
    const [editor, reviewer, viewer] = await Promise.all([
      client(id, team.editor.cookie), client(id, team.reviewer.cookie), client(id, team.viewer.cookie),
    ]);
    reviewer.doc.getText("intrusion").insert(0, "reviewer was here");
    viewer.doc.getText("intrusion").insert(0, "viewer was here");
    editor.doc.getText("allowed").insert(0, "editor");
    // Reads still work for them: the editor's change reaches both.
    await waitFor(reviewer.doc, (d) => d.getText("allowed").toString() === "editor", "editor's text at reviewer");
    await waitFor(viewer.doc, (d) => d.getText("allowed").toString() === "editor", "editor's text at viewer");
    await processed(reviewer, editor);
    await processed(viewer, editor);
    await barrier(editor, viewer);
    expect(editor.doc.getText("intrusion").toString()).toBe("");
    expect((await storedDoc(id)).getText("intrusion").toString()).toBe("");
    expect((await storedDoc(id)).getText("allowed").toString()).toBe("editor");
    close(editor, reviewer, viewer);
  }, 20_000);

  it("drops a reviewer's offline edits sent as sync step 2 after a reconnect", async () => {
    const id = await newDocument();
    const editor = await client(id, team.editor.cookie);
    const reviewer = await client(id, team.reviewer.cookie);
    reviewer.provider.disconnect();
    // Edits made while disconnected travel in the reviewer's sync step 2 when it reconnects.
    reviewer.doc.getText("offline").insert(0, "edited offline by the reviewer");
    const note = readDoc(reviewer.doc).blocks.find((b) => b.kind === "note")!;
    setParam(reviewer.doc, note.id, "smuggled", "1 kg");
    reviewer.provider.connect();
    await whenSynced(reviewer); // by now the reviewer has sent its step 2 (it answers the server's step 1 first)
    await processed(reviewer, editor);
    await barrier(editor, reviewer);
    // A fresh connection syncs after the reconnect; it must not have the reviewer's edits.
    const late = await client(id, team.owner.cookie);
    expect(late.doc.getText("offline").toString()).toBe("");
    expect(editor.doc.getText("offline").toString()).toBe("");
    const stored = await storedDoc(id);
    expect(stored.getText("offline").toString()).toBe("");
    expect(readDoc(stored).blocks.find((b) => b.id === note.id)?.params.smuggled).toBeUndefined();
    close(editor, reviewer, late);
  });

  it("lets an editor's offline edits in through sync step 2 after a reconnect", async () => {
    const id = await newDocument();
    const editor = await client(id, team.editor.cookie);
    const other = await client(id, team.owner.cookie);
    editor.provider.disconnect();
    editor.doc.getText("offline").insert(0, "written on the train");
    editor.provider.connect();
    await waitFor(other.doc, (d) => d.getText("offline").toString() === "written on the train", "offline edit at the other client");
    expect((await storedDoc(id)).getText("offline").toString()).toBe("written on the train");
    close(editor, other);
  });

  it("makes an archived document read-only, also for its owner", async () => {
    const id = await newDocument();
    await setDocumentArchived({ documentId: id, archived: true });
    const owner = await client(id, team.owner.cookie);
    const editor = await client(id, team.editor.cookie);
    owner.doc.getText("t").insert(0, "owner");
    editor.doc.getText("t").insert(0, "editor");
    await processed(owner, editor);
    await processed(editor, owner);
    // No editor can write here to serve as a barrier; a wrongly accepted write is stored within milliseconds.
    await new Promise((r) => setTimeout(r, 300));
    expect((await storedDoc(id)).getText("t").toString()).toBe("");
    expect(await countDocumentUpdates({ documentId: id })).toBe(0);
    close(owner, editor);
  });

  it("refuses upgrades before any sync: signed out 401, cross-origin 403, outsider and unknown ids 404", async () => {
    const id = await newDocument();
    const room = `${url}/${id}`;
    expect(await tryUpgrade({ url: room, cookie: null })).toEqual({ status: 401, messages: 0 });
    expect(await tryUpgrade({ url: room, cookie: "joulebook_session=forged-session-id" })).toEqual({ status: 401, messages: 0 });
    expect(await tryUpgrade({ url: room, cookie: team.editor.cookie, origin: "http://evil.example" })).toEqual({ status: 403, messages: 0 });
    expect(await tryUpgrade({ url: room, cookie: team.editor.cookie, origin: null })).toEqual({ status: 403, messages: 0 });
    expect(await tryUpgrade({ url: room, cookie: team.outsider.cookie })).toEqual({ status: 404, messages: 0 });
    expect(await tryUpgrade({ url: `${url}/00000000-0000-4000-8000-000000000000`, cookie: team.editor.cookie })).toEqual({ status: 404, messages: 0 });
    expect(await tryUpgrade({ url: `${url}/not-a-document`, cookie: team.editor.cookie })).toEqual({ status: 404, messages: 0 });
    // The same member with the right Origin gets in and receives sync step 1.
    const ok = await tryUpgrade({ url: room, cookie: team.viewer.cookie });
    expect(ok.status).toBe(101);
    expect(ok.messages).toBeGreaterThan(0);
  });

  it("compacts past the threshold into one snapshot, keeping the content identical", async () => {
    const id = await newDocument();
    const a = await client(id, team.editor.cookie);
    const b = await client(id, team.owner.cookie);
    const log = a.doc.getArray<number>("log");
    for (let i = 0; i < COMPACT_THRESHOLD * 3; i++) {
      log.push([i]);
      if (i % 7 === 0) a.doc.getText("t").insert(0, `${i};`);
      if (i % 11 === 0) await new Promise((r) => setTimeout(r, 5)); // let several batches form
    }
    await barrier(a, b);
    // Wait for the compaction that the last batches started (it runs beside the write queue).
    const deadline = Date.now() + 10_000;
    while ((await countDocumentUpdates({ documentId: id })) >= COMPACT_THRESHOLD && Date.now() < deadline) await new Promise((r) => setTimeout(r, 20));
    expect(await countDocumentUpdates({ documentId: id })).toBeLessThan(COMPACT_THRESHOLD);
    expect(await countDocumentSnapshots({ documentIds: [id] })).toBe(1);
    const stored = await storedDoc(id);
    expect(stored.getArray("log").toJSON()).toEqual(a.doc.getArray("log").toJSON());
    expect(stored.getText("t").toString()).toBe(a.doc.getText("t").toString());
    expect(readDoc(stored)).toEqual(readDoc(a.doc));
    close(a, b);
  });

  it("releases the document from memory when the last client leaves, and reloads it after", async () => {
    const id = await newDocument();
    const a = await client(id, team.editor.cookie);
    const b = await client(id, team.viewer.cookie);
    expect(docs.has(id)).toBe(true);
    a.doc.getText("t").insert(0, "kept");
    await waitFor(b.doc, (d) => d.getText("t").toString() === "kept", "edit at b");
    close(a);
    await new Promise((r) => setTimeout(r, 100));
    expect(docs.has(id)).toBe(true); // b is still there
    close(b);
    const deadline = Date.now() + 5000;
    while (docs.has(id) && Date.now() < deadline) await new Promise((r) => setTimeout(r, 10));
    expect(docs.has(id)).toBe(false);
    const c = await client(id, team.viewer.cookie);
    expect(c.doc.getText("t").toString()).toBe("kept");
    close(c);
  });

  it("hands a rename through the API to clients that have the document open", async () => {
    const id = await newDocument("Old name");
    const viewer = await client(id, team.viewer.cookie);
    process.env.COLLAB_URL = url;
    try {
      const res = await call(documentRoute.PATCH, "PATCH", "/", { cookie: team.editor.cookie, params: { workspaceId: team.workspaceId, documentId: id }, body: { name: "New name" } });
      expect(res.status).toBe(200);
    } finally {
      delete process.env.COLLAB_URL;
    }
    await waitFor(viewer.doc, (d) => readDoc(d).name === "New name", "the new name at the open client");
    close(viewer);
  });

  it("re-checks open connections: a demoted editor turns read-only, a removed member is disconnected", async () => {
    const id = await newDocument();
    const member = await newUser("demoted");
    await addMembership({ workspaceId: team.workspaceId, userId: member.id, role: "editor" });
    const [m, owner, viewer] = await Promise.all([client(id, member.cookie), client(id, team.owner.cookie), client(id, team.viewer.cookie)]);
    m.doc.getText("t").insert(0, "before;");
    await waitFor(owner.doc, (d) => d.getText("t").toString() === "before;", "edit before the demotion");
    await setMembershipRole({ workspaceId: team.workspaceId, userId: member.id, role: "reviewer" });
    await new Promise((r) => setTimeout(r, RECHECK_MS * 6)); // several re-checks have run
    m.doc.getText("t").insert(0, "after;");
    await processed(m, owner);
    await barrier(owner, viewer);
    expect(owner.doc.getText("t").toString()).toBe("before;");
    expect((await storedDoc(id)).getText("t").toString()).toBe("before;");
    // Removed from the workspace: the server closes the connection with 4404 (final for y-websocket).
    const closed = new Promise<number>((resolve) => m.provider.on("connection-close", (event) => resolve(event?.code ?? 0)));
    await deleteMembership({ workspaceId: team.workspaceId, userId: member.id });
    expect(await closed).toBe(4404);
    close(m, owner, viewer);
  });

  it("touches documents.updated_at when edits arrive", async () => {
    const id = await newDocument();
    const before = (await getDocument({ documentId: id }))!.updatedAt;
    await new Promise((r) => setTimeout(r, 20));
    const a = await client(id, team.editor.cookie);
    const b = await client(id, team.viewer.cookie);
    a.doc.getText("t").insert(0, "x");
    await waitFor(b.doc, (d) => d.getText("t").toString() === "x", "edit at b");
    close(a, b);
    const deadline = Date.now() + 5000;
    let after = before;
    while (after.getTime() === before.getTime() && Date.now() < deadline) {
      await new Promise((r) => setTimeout(r, 20));
      after = (await getDocument({ documentId: id }))!.updatedAt;
    }
    expect(after.getTime()).toBeGreaterThan(before.getTime());
  });

  it("leaves every document released once all clients are gone", async () => {
    for (const c of [...open]) close(c);
    const deadline = Date.now() + 5000;
    while (docs.size > 0 && Date.now() < deadline) await new Promise((r) => setTimeout(r, 10));
    expect(docs.size).toBe(0);
    const health = await fetch(`http://127.0.0.1:${server.port}/health`).then((r) => r.json());
    expect(health).toMatchObject({ ok: true, documents: 0, connections: 0 });
    expect(health.relay.n).toBeGreaterThan(0); // updates were stored and relayed in this file
  });
});
