// Documents API (issue 5 §6) against real PostgreSQL: create from each powertrain's template,
// list / search / sort / archived, rename, duplicate, archive, summary, permissions; and the
// state helpers (load, append, compact) other features build on.
// Expected permissions: DESIGN §1 (reviewers and viewers read, never edit; non-members learn nothing).
import { beforeAll, describe, expect, it } from "vitest";
import * as Y from "yjs";
import * as documentRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/route";
import * as archiveRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/archive/route";
import * as duplicateRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/duplicate/route";
import * as summaryRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/summary/route";
import * as unarchiveRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/unarchive/route";
import * as documentsRoute from "@/app/api/workspaces/[workspaceId]/documents/route";
import {
  appendDocumentUpdate, compactDocumentUpdates, countDocumentUpdates, loadDocumentState,
} from "@/db/document-updates";
import { POWERTRAINS, REQUIRED_KINDS } from "@/lib/notebook/block-kinds";
import { compile, readDoc } from "@/lib/notebook";
import { bodyOf, call } from "./support/http";
import { newWorkspace, teamWorkspace, type TestUser } from "./support/users";

type Team = Awaited<ReturnType<typeof teamWorkspace>>;
let team: Team;

beforeAll(async () => {
  team = await teamWorkspace();
});

async function create(user: TestUser, name: string, powertrain: string, workspaceId = team.workspaceId) {
  return call(documentsRoute.POST, "POST", "/", { cookie: user.cookie, params: { workspaceId }, body: { name, powertrain } });
}

async function createOk(name: string, powertrain = "bev"): Promise<string> {
  const res = await create(team.editor, name, powertrain);
  expect(res.status, await res.clone().text()).toBe(201);
  return (await bodyOf(res)).document.id;
}

async function list(query = "", user: TestUser = team.viewer) {
  const res = await call(documentsRoute.GET, "GET", `/api/workspaces/${team.workspaceId}/documents${query}`, { cookie: user.cookie, params: { workspaceId: team.workspaceId } });
  return { status: res.status, body: await bodyOf(res) };
}

async function stored(documentId: string): Promise<Y.Doc> {
  const d = new Y.Doc();
  Y.applyUpdate(d, await loadDocumentState({ documentId }));
  return d;
}

const params = (documentId: string) => ({ workspaceId: team.workspaceId, documentId });

describe("documents: create from templates", () => {
  it.each(POWERTRAINS.map((p) => [p]))("creates a %s document whose stored state compiles for that powertrain", async (powertrain) => {
    const res = await create(team.editor, `Template ${powertrain}`, powertrain);
    expect(res.status).toBe(201);
    const { document } = await bodyOf(res);
    expect(document).toMatchObject({ name: `Template ${powertrain}`, powertrain, archived: false, summary: null, createdBy: { id: team.editor.id } });
    const doc = await stored(document.id);
    const snapshot = readDoc(doc);
    expect(snapshot.name).toBe(`Template ${powertrain}`);
    expect(snapshot.powertrain).toBe(powertrain);
    // Every component the powertrain needs is present (DESIGN §5 chain), and the chain compiles.
    for (const kind of REQUIRED_KINDS[powertrain]) expect(snapshot.blocks.map((b) => b.kind)).toContain(kind);
    const compiled = compile(snapshot);
    expect(compiled.messages.filter((m) => m.severity === "error")).toEqual([]);
    expect(compiled.scenario?.powertrain).toBe(powertrain);
  });

  it("refuses an unknown powertrain and an empty name with 422 naming the field", async () => {
    const bad = await create(team.editor, "X", "steam");
    expect(bad.status).toBe(422);
    expect(Object.keys((await bodyOf(bad)).fields)).toEqual(["powertrain"]);
    const empty = await create(team.editor, "   ", "bev");
    expect(empty.status).toBe(422);
    expect(Object.keys((await bodyOf(empty)).fields)).toEqual(["name"]);
  });
});

describe("documents: list, search, sort", () => {
  let ids: Record<string, string>;
  beforeAll(async () => {
    const other = await teamWorkspace();
    team = other; // a workspace of its own, so the list holds exactly these documents
    ids = {
      alpha: await createOk("alpha van", "series"),
      bravo: await createOk("Bravo 100% electric", "bev"),
      charlie: await createOk("charlie_hybrid", "parallel"),
      delta: await createOk("Delta diesel", "conventional"),
    };
    const put = (id: string, kpi: Record<string, number | null>) =>
      call(summaryRoute.PUT, "PUT", "/", { cookie: team.editor.cookie, params: params(id), body: { kpi } });
    expect((await put(ids.alpha!, { fuel_l_per_100km: 5.2 })).status).toBe(200);
    expect((await put(ids.charlie!, { fuel_l_per_100km: 4.1 })).status).toBe(200);
    expect((await put(ids.delta!, { fuel_l_per_100km: 8.9, co2_g_per_km: 236 })).status).toBe(200);
    // bravo has no fuel figure: it sorts last either way.
  });

  const names = (body: { documents: { name: string }[] }) => body.documents.map((d) => d.name);

  it("sorts by name (case-insensitive), powertrain, KPI (missing last) and last edit", async () => {
    expect(names((await list("?sort=name")).body)).toEqual(["alpha van", "Bravo 100% electric", "charlie_hybrid", "Delta diesel"]);
    expect(names((await list("?sort=name&dir=desc")).body)).toEqual(["Delta diesel", "charlie_hybrid", "Bravo 100% electric", "alpha van"]);
    // Enum order of PostgreSQL: the order the powertrains were declared in (conventional, bev, parallel, series).
    expect(names((await list("?sort=powertrain")).body)).toEqual(["Delta diesel", "Bravo 100% electric", "charlie_hybrid", "alpha van"]);
    expect(names((await list("?sort=kpi&kpi=fuel_l_per_100km")).body)).toEqual(["charlie_hybrid", "alpha van", "Delta diesel", "Bravo 100% electric"]);
    expect(names((await list("?sort=kpi&kpi=fuel_l_per_100km&dir=desc")).body)).toEqual(["Delta diesel", "alpha van", "charlie_hybrid", "Bravo 100% electric"]);
    // Renaming counts as an edit: the renamed document comes first by last edit.
    await call(documentRoute.PATCH, "PATCH", "/", { cookie: team.editor.cookie, params: params(ids.bravo!), body: { name: "Bravo 100% electric" } });
    expect(names((await list("")).body)[0]).toBe("Bravo 100% electric");
  });

  it("searches names case-insensitively and treats % and _ literally", async () => {
    expect(names((await list("?q=VAN")).body)).toEqual(["alpha van"]);
    expect(names((await list("?q=100%25")).body)).toEqual(["Bravo 100% electric"]);
    expect(names((await list("?q=_")).body)).toEqual(["charlie_hybrid"]);
    expect(names((await list("?q=zzz")).body)).toEqual([]);
  });

  it("returns the documented fields and refuses a bad query string", async () => {
    const { body } = await list("?sort=name");
    // Other features may add fields (e.g. review state); these are the documents API's own.
    expect(Object.keys(body.documents[0])).toEqual(expect.arrayContaining(
      ["archived", "archivedAt", "createdAt", "createdBy", "id", "name", "powertrain", "summary", "updatedAt"],
    ));
    expect(body.documents[0].summary).toMatchObject({ kpi: { fuel_l_per_100km: 5.2 } });
    const bad = await list("?sort=colour");
    expect(bad.status).toBe(422);
    expect(Object.keys(bad.body.fields)).toEqual(["sort"]);
  });

  it("hides archived documents unless archived=1, and brings them back on unarchive", async () => {
    const res = await call(archiveRoute.POST, "POST", "/", { cookie: team.editor.cookie, params: params(ids.delta!) });
    expect(res.status).toBe(200);
    expect((await bodyOf(res)).document.archived).toBe(true);
    expect(names((await list("?sort=name")).body)).not.toContain("Delta diesel");
    expect(names((await list("?archived=1")).body)).toEqual(["Delta diesel"]);
    // Archived documents are read-only: no rename, no new summary.
    const rename = await call(documentRoute.PATCH, "PATCH", "/", { cookie: team.editor.cookie, params: params(ids.delta!), body: { name: "Renamed" } });
    expect(rename.status).toBe(409);
    const summary = await call(summaryRoute.PUT, "PUT", "/", { cookie: team.editor.cookie, params: params(ids.delta!), body: { kpi: { fuel_l: 1 } } });
    expect(summary.status).toBe(409);
    const back = await call(unarchiveRoute.POST, "POST", "/", { cookie: team.editor.cookie, params: params(ids.delta!) });
    expect(back.status).toBe(200);
    expect(names((await list("?sort=name")).body)).toContain("Delta diesel");
    // PATCH {archived} does the same.
    const patched = await call(documentRoute.PATCH, "PATCH", "/", { cookie: team.owner.cookie, params: params(ids.delta!), body: { archived: true } });
    expect((await bodyOf(patched)).document.archived).toBe(true);
  });
});

describe("documents: one document", () => {
  it("GET returns the document and the caller's role", async () => {
    const id = await createOk("Role probe");
    for (const who of ["owner", "editor", "reviewer", "viewer"] as const) {
      const res = await call(documentRoute.GET, "GET", "/", { cookie: team[who].cookie, params: params(id) });
      const body = await bodyOf(res);
      expect(res.status).toBe(200);
      expect(body.role).toBe(who);
      expect(body.canEdit).toBe(who === "owner" || who === "editor");
      expect(body.document.name).toBe("Role probe");
    }
  });

  it("rename changes the row and the document's own name (Yjs meta)", async () => {
    const id = await createOk("Before");
    const res = await call(documentRoute.PATCH, "PATCH", "/", { cookie: team.editor.cookie, params: params(id), body: { name: "  After  " } });
    expect(res.status).toBe(200);
    expect((await bodyOf(res)).document.name).toBe("After");
    expect(readDoc(await stored(id)).name).toBe("After");
    const empty = await call(documentRoute.PATCH, "PATCH", "/", { cookie: team.editor.cookie, params: params(id), body: {} });
    expect(empty.status).toBe(422);
  });

  it("duplicate copies the current state (snapshot and later updates) into a new document", async () => {
    const id = await createOk("Original", "parallel");
    // A later edit, stored as an update row the way the collaboration server stores it.
    const live = await stored(id);
    const before = Y.encodeStateVector(live);
    live.getText("later").insert(0, "edited after creation");
    await appendDocumentUpdate({ documentId: id, update: Y.encodeStateAsUpdate(live, before) });
    const res = await call(duplicateRoute.POST, "POST", "/", { cookie: team.editor.cookie, params: params(id), body: {} });
    expect(res.status).toBe(201);
    const copy = (await bodyOf(res)).document;
    expect(copy).toMatchObject({ name: "Original (copy)", powertrain: "parallel", createdBy: { id: team.editor.id } });
    expect(copy.id).not.toBe(id);
    const copied = await stored(copy.id);
    expect(copied.getText("later").toString()).toBe("edited after creation");
    expect(readDoc(copied).name).toBe("Original (copy)");
    expect(readDoc(copied).blocks).toEqual(readDoc(live).blocks);
    // The original keeps its name.
    expect(readDoc(await stored(id)).name).toBe("Original");
    const named = await call(duplicateRoute.POST, "POST", "/", { cookie: team.owner.cookie, params: params(id), body: { name: "Variant B" } });
    expect((await bodyOf(named)).document.name).toBe("Variant B");
  });

  it("summary accepts known finite figures and refuses unknown keys and wrong types", async () => {
    const id = await createOk("Figures");
    const ok = await call(summaryRoute.PUT, "PUT", "/", {
      cookie: team.editor.cookie, params: params(id), body: { kpi: { electric_kwh_per_100km: 16.8, soc_final: 0.42, feasible: true, fuel_l_per_100km: null } },
    });
    expect(ok.status).toBe(200);
    const summary = (await bodyOf(ok)).document.summary;
    expect(summary.kpi).toEqual({ electric_kwh_per_100km: 16.8, soc_final: 0.42, feasible: true, fuel_l_per_100km: null });
    expect(typeof summary.computedAt).toBe("string");
    const unknown = await call(summaryRoute.PUT, "PUT", "/", { cookie: team.editor.cookie, params: params(id), body: { kpi: { mpg: 40 } } });
    expect(unknown.status).toBe(422);
    const text = await call(summaryRoute.PUT, "PUT", "/", { cookie: team.editor.cookie, params: params(id), body: { kpi: { fuel_l: "5" } } });
    expect(text.status).toBe(422);
    expect(Object.keys((await bodyOf(text)).fields)).toEqual(["kpi.fuel_l"]);
  });

  it("answers 404 for a document of another workspace reached through this one, and for a bad id", async () => {
    const elsewhere = await newWorkspace(team.editor, "Elsewhere");
    const res = await create(team.editor, "Foreign", "bev", elsewhere);
    const foreignId = (await bodyOf(res)).document.id;
    const through = await call(documentRoute.GET, "GET", "/", { cookie: team.editor.cookie, params: params(foreignId) });
    expect(through.status).toBe(404);
    const bad = await call(documentRoute.GET, "GET", "/", { cookie: team.editor.cookie, params: params("not-a-uuid") });
    expect(bad.status).toBe(404);
  });

  it("keeps write actions from reviewers and viewers (403), outsiders (404) and the signed-out (401)", async () => {
    const id = await createOk("Guarded");
    for (const who of ["reviewer", "viewer"] as const) {
      const u = team[who];
      expect((await create(u, "Nope", "bev")).status).toBe(403);
      expect((await call(documentRoute.PATCH, "PATCH", "/", { cookie: u.cookie, params: params(id), body: { name: "Nope" } })).status).toBe(403);
      expect((await call(documentRoute.PATCH, "PATCH", "/", { cookie: u.cookie, params: params(id), body: { archived: true } })).status).toBe(403);
      expect((await call(duplicateRoute.POST, "POST", "/", { cookie: u.cookie, params: params(id), body: {} })).status).toBe(403);
      expect((await call(archiveRoute.POST, "POST", "/", { cookie: u.cookie, params: params(id) })).status).toBe(403);
      expect((await call(summaryRoute.PUT, "PUT", "/", { cookie: u.cookie, params: params(id), body: { kpi: {} } })).status).toBe(403);
    }
    expect((await call(documentRoute.GET, "GET", "/", { cookie: team.outsider.cookie, params: params(id) })).status).toBe(404);
    expect((await call(documentRoute.GET, "GET", "/", { cookie: null, params: params(id) })).status).toBe(401);
    expect(readDoc(await stored(id)).name).toBe("Guarded");
  });
});

describe("document state helpers", () => {
  it("compaction folds every update row into the snapshot and keeps the content identical", async () => {
    const id = await createOk("Compaction", "series");
    const live = await stored(id);
    for (let i = 0; i < 40; i++) {
      const sv = Y.encodeStateVector(live);
      live.getArray<number>("log").push([i]);
      if (i % 3 === 0) live.getText("t").insert(0, `${i},`);
      if (i % 10 === 9) live.getText("t").delete(0, 2);
      await appendDocumentUpdate({ documentId: id, update: Y.encodeStateAsUpdate(live, sv) });
    }
    expect(await countDocumentUpdates({ documentId: id })).toBe(40);
    const before = readDoc(await stored(id));
    const beforeDoc = await stored(id);
    const beforeText = beforeDoc.getText("t").toString();
    expect(await compactDocumentUpdates({ documentId: id })).toBe(40);
    expect(await countDocumentUpdates({ documentId: id })).toBe(0);
    const after = await stored(id);
    expect(readDoc(after)).toEqual(before);
    expect(after.getText("t").toString()).toBe(beforeText);
    expect(beforeText).toBe(live.getText("t").toString());
    expect(after.getArray("log").toJSON()).toEqual(live.getArray("log").toJSON());
    expect(await compactDocumentUpdates({ documentId: id })).toBe(0);
  });
});
