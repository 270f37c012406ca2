// Team library: upload preview (nothing stored), save (validated again on the server), list with
// uploader, time, source note and usage, read, and delete refused while documents use the item.
import { describe, expect, it } from "vitest";
import * as Y from "yjs";
import * as libraryRoute from "@/app/api/workspaces/[workspaceId]/library/route";
import * as previewRoute from "@/app/api/workspaces/[workspaceId]/library/preview/route";
import * as itemRoute from "@/app/api/workspaces/[workspaceId]/library/[itemId]/route";
import { getDb } from "@/db/client";
import { documents, documentSnapshots } from "@/db/schema-documents";
import { libraryItems } from "@/db/schema-library";
import { createScenarioDoc, readDoc, setParam } from "@/lib/notebook";
import { UPLOAD_REQUEST_LIMIT_BYTES } from "@/lib/library/request";
import { APP, bodyOf, call } from "./support/http";
import { teamWorkspace } from "./support/users";

const CSV = "time [s],speed [km/h]\n0,0\n10,36\n20,36\n30,0\n";
const BAD = "time [s],speed [km/h]\n0,0\n1,fast\n2,2\n";

const list = (ws: string, cookie: string) => call(libraryRoute.GET, "GET", `/api/workspaces/${ws}/library`, { cookie, params: { workspaceId: ws } });
const save = (ws: string, cookie: string, body: unknown) => call(libraryRoute.POST, "POST", `/api/workspaces/${ws}/library`, { cookie, body, params: { workspaceId: ws } });
const preview = (ws: string, cookie: string, body: unknown) => call(previewRoute.POST, "POST", `/api/workspaces/${ws}/library/preview`, { cookie, body, params: { workspaceId: ws } });

async function confirmedSave(ws: string, cookie: string, text = CSV, name = "Depot loop") {
  const p = await bodyOf(await preview(ws, cookie, { kind: "cycle", text }));
  return save(ws, cookie, { kind: "cycle", text, confirmation: p.confirmation, name, source_note: "logged on the depot loop, 2026-11" });
}

async function documentUsing(workspaceId: string, itemId: string, name: string) {
  const doc = createScenarioDoc("bev", name, new Y.Doc());
  const cycle = readDoc(doc).blocks.find((b) => b.kind === "drive_cycle")!;
  setParam(doc, cycle.id, "source", "library");
  setParam(doc, cycle.id, "library_id", itemId);
  const [row] = await getDb().insert(documents).values({ workspaceId, name, powertrain: "bev" }).returning({ id: documents.id });
  await getDb().insert(documentSnapshots).values({ documentId: row.id, state: Y.encodeStateAsUpdate(doc) });
  return row.id;
}

describe("team library API", () => {
  it("previews an upload (JSON text) with proposal, statistics and label, storing nothing", async () => {
    const t = await teamWorkspace();
    const res = await preview(t.workspaceId, t.editor.cookie, { kind: "cycle", text: CSV });
    expect(res.status).toBe(200);
    const body = await bodyOf(res);
    expect(body.ok).toBe(true);
    expect(body.confirmation).toMatchObject({ speed: { column: 2, unit: "km/h" }, time: { column: 1, unit: "s" } });
    expect(body.data).toEqual({ dt_s: 10, speed_kmh: [0, 36, 36, 0] });
    // trapezoid: 50 + 100 + 50 = 200 m
    expect(body.summary.distance_km).toBeCloseTo(0.2, 12);
    expect(body.summary.recognition).toMatch(/^published cycles are checked at 1 Hz/);
    expect(await getDb().select().from(libraryItems)).toHaveLength(0);
  });

  it("previews a multipart file upload and refuses non-UTF-8 bytes with the line", async () => {
    const t = await teamWorkspace();
    const form = new FormData();
    form.set("kind", "cycle");
    form.set("file", new Blob([new Uint8Array([...new TextEncoder().encode("time,speed\n0,0\n1,1\n# caf"), 0xe9])]), "latin1.csv");
    const req = new Request(`${APP}/api/workspaces/${t.workspaceId}/library/preview`, { method: "POST", body: form, headers: { host: "127.0.0.1:3210", origin: APP, cookie: t.editor.cookie } });
    const res = await previewRoute.POST(req, { params: Promise.resolve({ workspaceId: t.workspaceId }) });
    const body = await bodyOf(res);
    expect(body.ok).toBe(false);
    expect(body.issues[0]).toMatchObject({ line: 4, column: null, message: "not UTF-8 text (byte 0xE9 at byte 24); save the file as UTF-8 and upload again" });
  });

  it("refuses to save a file with problems (422 with line and column) and stores nothing", async () => {
    const t = await teamWorkspace();
    const conf = { delimiter: ",", decimal: ".", header_rows: 1, time: { column: 1, unit: "s" }, speed: { column: 2, unit: "km/h" }, grade: null };
    const res = await save(t.workspaceId, t.editor.cookie, { kind: "cycle", text: BAD, confirmation: conf, name: "bad" });
    expect(res.status).toBe(422);
    const body = await bodyOf(res);
    expect(body.issues[0]).toMatchObject({ line: 3, column: 2, message: '"fast" is not a number' });
    expect(await getDb().select().from(libraryItems)).toHaveLength(0);
  });

  it("saves, lists with uploader, time, source and usage; reads the data back", async () => {
    const t = await teamWorkspace();
    const res = await confirmedSave(t.workspaceId, t.editor.cookie);
    expect(res.status).toBe(201);
    const { item } = await bodyOf(res);
    const items = (await bodyOf(await list(t.workspaceId, t.viewer.cookie))).items;
    expect(items).toHaveLength(1);
    expect(items[0]).toMatchObject({ id: item.id, kind: "cycle", name: "Depot loop", sourceNote: "logged on the depot loop, 2026-11", uploadedBy: { id: t.editor.id }, usedBy: [] });
    expect(new Date(items[0].createdAt).getTime()).toBeGreaterThan(Date.now() - 60_000);
    const got = await bodyOf(await call(itemRoute.GET, "GET", "/", { cookie: t.viewer.cookie, params: { workspaceId: t.workspaceId, itemId: item.id } }));
    expect(got.item.data).toEqual({ dt_s: 10, speed_kmh: [0, 36, 36, 0] });
  });

  it("reviewers and viewers cannot upload; outsiders see nothing", async () => {
    const t = await teamWorkspace();
    expect((await confirmedSave(t.workspaceId, t.viewer.cookie)).status).toBe(403);
    expect((await preview(t.workspaceId, t.reviewer.cookie, { kind: "cycle", text: CSV })).status).toBe(403);
    expect((await list(t.workspaceId, t.outsider.cookie)).status).toBe(404);
    expect((await list(t.workspaceId, "")).status).toBe(401);
  });

  it("refuses to delete an item in use (409 with the documents), then deletes it once unused", async () => {
    const t = await teamWorkspace();
    const { item } = await bodyOf(await confirmedSave(t.workspaceId, t.editor.cookie));
    const d1 = await documentUsing(t.workspaceId, item.id, "Van A");
    const d2 = await documentUsing(t.workspaceId, item.id, "Van B");
    const one = await bodyOf(await call(itemRoute.GET, "GET", `/api/workspaces/${t.workspaceId}/library/${item.id}?usage=1`, { cookie: t.viewer.cookie, params: { workspaceId: t.workspaceId, itemId: item.id } }));
    expect(one.item.usedBy.map((d: { title: string }) => d.title)).toEqual(["Van A", "Van B"]);
    const listed = (await bodyOf(await list(t.workspaceId, t.editor.cookie))).items[0];
    expect(listed.usedBy.map((d: { id: string }) => d.id).sort()).toEqual([d1, d2].sort());
    const del = await call(itemRoute.DELETE, "DELETE", "/", { cookie: t.editor.cookie, params: { workspaceId: t.workspaceId, itemId: item.id } });
    expect(del.status).toBe(409);
    const body = await bodyOf(del);
    expect(body.error).toBe('"Depot loop" is used by 2 documents: "Van A", "Van B"; change their drive-cycle blocks first');
    expect(body.documents.map((d: { title: string }) => d.title)).toEqual(["Van A", "Van B"]);
    await getDb().delete(documents);
    const ok = await call(itemRoute.DELETE, "DELETE", "/", { cookie: t.editor.cookie, params: { workspaceId: t.workspaceId, itemId: item.id } });
    expect(ok.status).toBe(204);
    expect((await bodyOf(await list(t.workspaceId, t.editor.cookie))).items).toHaveLength(0);
  });

  it("a request body above the upload cap is refused with 413 before it is read", async () => {
    const t = await teamWorkspace();
    const res = await call(previewRoute.POST, "POST", "/", {
      cookie: t.editor.cookie, params: { workspaceId: t.workspaceId }, rawBody: "{}",
      headers: { "content-type": "application/json", "content-length": String(UPLOAD_REQUEST_LIMIT_BYTES + 1) },
    });
    expect(res.status).toBe(413);
  });

  it("an item of another workspace is 404 by id", async () => {
    const a = await teamWorkspace();
    const b = await teamWorkspace();
    const { item } = await bodyOf(await confirmedSave(a.workspaceId, a.editor.cookie));
    const res = await call(itemRoute.GET, "GET", "/", { cookie: b.owner.cookie, params: { workspaceId: b.workspaceId, itemId: item.id } });
    expect(res.status).toBe(404);
  });
});
