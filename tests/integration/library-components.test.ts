// Component curves in the team library (engine full-load, battery OCV) referenced by id from
// engine and battery blocks: usage counts them, deleting one in use is refused with the
// documents, an edit that drops the reference frees the item, and the server resolver hands
// the saved curve to compile (and refuses an item of the wrong kind).
import { describe, expect, it } from "vitest";
import * as Y from "yjs";
import * as libraryRoute from "@/app/api/workspaces/[workspaceId]/library/route";
import * as previewRoute from "@/app/api/workspaces/[workspaceId]/library/preview/route";
import * as itemRoute from "@/app/api/workspaces/[workspaceId]/library/[itemId]/route";
import { getDb } from "@/db/client";
import { documents, documentSnapshots, documentUpdates } from "@/db/schema-documents";
import { libraryResolverFor } from "@/lib/library/resolver";
import { compile, createScenarioDoc, readDoc, setParam } from "@/lib/notebook";
import { bodyOf, call } from "./support/http";
import { teamWorkspace } from "./support/users";

const FULL_LOAD = "speed [rpm],torque [N·m]\n800,110\n3000,160\n6000,125\n";
const OCV = "SOC [%],OCV [V]\n0,300\n50,360\n100,400\n";

const list = (ws: string, cookie: string) => call(libraryRoute.GET, "GET", `/api/workspaces/${ws}/library`, { cookie, params: { workspaceId: ws } });
const remove = (ws: string, cookie: string, itemId: string) => call(itemRoute.DELETE, "DELETE", "/", { cookie, params: { workspaceId: ws, itemId } });

async function saveItem(ws: string, cookie: string, kind: "engine_full_load" | "battery_ocv", text: string, name: string): Promise<string> {
  const p = await bodyOf(await call(previewRoute.POST, "POST", "/", { cookie, body: { kind, text }, params: { workspaceId: ws } }));
  expect(p.ok).toBe(true);
  const res = await call(libraryRoute.POST, "POST", "/", { cookie, body: { kind, text, confirmation: p.confirmation, name, source_note: "bench data" }, params: { workspaceId: ws } });
  expect(res.status).toBe(201);
  return (await bodyOf(res)).item.id;
}

/** A parallel hybrid (engine + battery) whose blocks name the given items; stored as a snapshot. */
async function hybridUsing(workspaceId: string, name: string, refs: { fullLoad?: string; ocv?: string }) {
  const doc = createScenarioDoc("parallel", name, new Y.Doc());
  const blocks = readDoc(doc).blocks;
  const engine = blocks.find((b) => b.kind === "engine")!;
  const battery = blocks.find((b) => b.kind === "battery_pack")!;
  if (refs.fullLoad) setParam(doc, engine.id, "full_load_library_id", refs.fullLoad);
  if (refs.ocv) setParam(doc, battery.id, "ocv_library_id", refs.ocv);
  const [row] = await getDb().insert(documents).values({ workspaceId, name, powertrain: "parallel" }).returning({ id: documents.id });
  await getDb().insert(documentSnapshots).values({ documentId: row.id, state: Y.encodeStateAsUpdate(doc) });
  return { id: row.id, doc, engineId: engine.id };
}

describe("component curves from the library in blocks", () => {
  it("counts engine and battery references as usage and refuses deletion (409 with the documents)", async () => {
    const t = await teamWorkspace();
    const fl = await saveItem(t.workspaceId, t.editor.cookie, "engine_full_load", FULL_LOAD, "1.6 L bench");
    const ocv = await saveItem(t.workspaceId, t.editor.cookie, "battery_ocv", OCV, "NMC module");
    const a = await hybridUsing(t.workspaceId, "Hybrid A", { fullLoad: fl, ocv });
    await hybridUsing(t.workspaceId, "Hybrid B", { fullLoad: fl });

    const items = (await bodyOf(await list(t.workspaceId, t.viewer.cookie))).items as { id: string; usedBy: { title: string }[] }[];
    const usedBy = (id: string) => items.find((i) => i.id === id)!.usedBy.map((d) => d.title).sort();
    expect(usedBy(fl)).toEqual(["Hybrid A", "Hybrid B"]);
    expect(usedBy(ocv)).toEqual(["Hybrid A"]);

    const del = await remove(t.workspaceId, t.editor.cookie, fl);
    expect(del.status).toBe(409);
    const body = await bodyOf(del);
    expect(body.error).toBe('"1.6 L bench" is used by 2 documents: "Hybrid A", "Hybrid B"; change their engine blocks first');
    expect(body.documents.map((d: { title: string }) => d.title).sort()).toEqual(["Hybrid A", "Hybrid B"]);
    const delOcv = await remove(t.workspaceId, t.editor.cookie, ocv);
    expect(delOcv.status).toBe(409);
    expect((await bodyOf(delOcv)).error).toBe('"NMC module" is used by 1 document: "Hybrid A"; change their battery pack blocks first');

    // An edit not yet merged into the snapshot (as the collaboration server stores it) frees the OCV curve.
    const before = Y.encodeStateVector(a.doc);
    const battery = readDoc(a.doc).blocks.find((b) => b.kind === "battery_pack")!;
    setParam(a.doc, battery.id, "ocv_library_id", "");
    await getDb().insert(documentUpdates).values({ documentId: a.id, update: Y.encodeStateAsUpdate(a.doc, before) });
    expect((await remove(t.workspaceId, t.editor.cookie, ocv)).status).toBe(204);
  });

  it("the server resolver gives compile the saved curves, and compile refuses a curve of the wrong kind", async () => {
    const t = await teamWorkspace();
    const fl = await saveItem(t.workspaceId, t.editor.cookie, "engine_full_load", FULL_LOAD, "1.6 L bench");
    const ocv = await saveItem(t.workspaceId, t.editor.cookie, "battery_ocv", OCV, "NMC module");
    const good = await hybridUsing(t.workspaceId, "Good", { fullLoad: fl, ocv });
    const snap = readDoc(good.doc);
    const out = compile({ ...snap, resolveLibrary: await libraryResolverFor({ workspaceId: t.workspaceId, blocks: snap.blocks }) });
    expect(out.messages.filter((m) => m.severity === "error")).toEqual([]);
    expect((out.scenario?.engine as Record<string, unknown>).max_torque_nm).toEqual({ speed_rpm: [800, 3000, 6000], torque_nm: [110, 160, 125] });
    expect((out.scenario?.battery as Record<string, unknown>).ocv).toEqual({ soc: [0, 0.5, 1], voltage_v: [300, 360, 400] });

    const wrong = await hybridUsing(t.workspaceId, "Wrong", { fullLoad: ocv });
    const wsnap = readDoc(wrong.doc);
    const bad = compile({ ...wsnap, resolveLibrary: await libraryResolverFor({ workspaceId: t.workspaceId, blocks: wsnap.blocks }) });
    expect(bad.scenario).toBeUndefined();
    expect(bad.messages).toContainEqual(expect.objectContaining({
      blockId: wrong.engineId, field: "full_load_library_id",
      text: 'Engine › full-load curve: library item "NMC module" is a battery OCV curve, not an engine full-load curve',
    }));
    // another workspace's item is not found
    const other = await teamWorkspace();
    const foreign = compile({ ...snap, resolveLibrary: await libraryResolverFor({ workspaceId: other.workspaceId, blocks: snap.blocks }) });
    expect(foreign.messages).toContainEqual(expect.objectContaining({ field: "full_load_library_id", text: expect.stringContaining("no item") }));
  });
});
