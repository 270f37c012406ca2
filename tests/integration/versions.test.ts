// Versions API: save (computed on the server from the stored document), list, read, diff and
// restore as a forward change. Physics reference for the diff: rolling resistance work is
// c_r·m·g·cos α per metre while moving (DESIGN §4), so on the same cycle it scales with mass.
import { describe, expect, it, beforeAll } from "vitest";
import * as Y from "yjs";
import * as versionsRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/versions/route";
import * as versionRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/versions/[versionId]/route";
import * as restoreRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/versions/[versionId]/restore/route";
import * as diffRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/diff/route";
import { countDocumentUpdates, loadDocumentState } from "@/db/document-updates";
import { readDoc, readBlocks, removeBlock } from "@/lib/notebook";
import { bodyOf, call } from "./support/http";
import { teamWorkspace } from "./support/users";
import { editLive, params, saveVersion, setMass, vanDocument, type Team } from "./versions-support";

let team: Team;
beforeAll(async () => {
  team = await teamWorkspace();
});

async function liveSnapshot(documentId: string) {
  const doc = new Y.Doc();
  Y.applyUpdate(doc, await loadDocumentState({ documentId }));
  return readDoc(doc);
}

describe("saving and listing versions", () => {
  it("an editor saves v1 and v2; the server computes figures from the stored document", async () => {
    const documentId = await vanDocument(team);
    const v1 = await saveVersion(team, documentId, team.editor, "Baseline", "template van");
    expect(v1.status).toBe(201);
    expect(v1.body.version).toMatchObject({ number: 1, name: "Baseline", message: "template van", author: { id: team.editor.id }, problems: [] });
    expect(v1.body.version.kpi.fuel_l_per_100km).toBeGreaterThan(0);
    await editLive(documentId, setMass("2100 kg"));
    const v2 = await saveVersion(team, documentId, team.owner, "Loaded van");
    expect(v2.body.version.number).toBe(2);
    expect(v2.body.version.kpi.fuel_l_per_100km).toBeGreaterThan(v1.body.version.kpi.fuel_l_per_100km);

    const list = await bodyOf(await call(versionsRoute.GET, "GET", "/", { cookie: team.viewer.cookie, params: params(team, documentId) }));
    expect(list.versions.map((v: { number: number }) => v.number)).toEqual([2, 1]);
    expect(list.versions[0]).not.toHaveProperty("snapshot");

    const one = await bodyOf(await call(versionRoute.GET, "GET", "/", { cookie: team.reviewer.cookie, params: params(team, documentId, { versionId: v1.body.version.id }) }));
    const body = one.version.snapshot.blocks.find((b: { kind: string }) => b.kind === "body");
    expect(body.params.mass).toBe("curb_mass + payload");
    expect(one.version.scenario.vehicle.mass_kg).toBe(1500);
    expect(one.version.summary.ledger_j.rolling).toBeGreaterThan(0);
    expect(one.version.summary.traces.time_s.length).toBeGreaterThan(100);
  });

  it("a draft that does not compile is still saved, with the reason and no figures", async () => {
    const documentId = await vanDocument(team);
    await editLive(documentId, setMass("heavy"));
    const v = await saveVersion(team, documentId, team.editor, "Half done");
    expect(v.status).toBe(201);
    expect(v.body.version.kpi).toBeNull();
    expect(v.body.version.problems.join(" ")).toMatch(/test mass/i);
  });

  it("reviewers and viewers cannot save; bad names are refused with the field named", async () => {
    const documentId = await vanDocument(team);
    expect((await saveVersion(team, documentId, team.reviewer, "x")).status).toBe(403);
    expect((await saveVersion(team, documentId, team.viewer, "x")).status).toBe(403);
    expect((await saveVersion(team, documentId, team.outsider, "x")).status).toBe(404);
    const bad = await saveVersion(team, documentId, team.editor, "   ");
    expect(bad.status).toBe(422);
    expect(bad.body.fields.name).toMatch(/version name/);
  });

  it("concurrent saves get distinct consecutive numbers", async () => {
    const documentId = await vanDocument(team);
    const saved = await Promise.all([1, 2, 3, 4].map((i) => saveVersion(team, documentId, team.editor, `s${i}`)));
    expect(saved.map((s) => s.body.version.number).sort()).toEqual([1, 2, 3, 4]);
  });
});

describe("diff", () => {
  it("v1 → v2 shows the mass change with units, KPI deltas and the rolling-resistance ledger row", async () => {
    const documentId = await vanDocument(team);
    const v1 = (await saveVersion(team, documentId, team.editor, "1500 kg")).body.version;
    await editLive(documentId, setMass("2100 kg"));
    const v2 = (await saveVersion(team, documentId, team.editor, "2100 kg")).body.version;
    const res = await call(diffRoute.GET, "GET", `/?from=${v1.id}&to=${v2.id}`, { cookie: team.viewer.cookie, params: params(team, documentId) });
    expect(res.status).toBe(200);
    const { diff } = await bodyOf(res);
    expect(diff.counts).toEqual({ added: 0, removed: 0, moved: 0, changed: 1 });
    const mass = diff.blocks.find((b: { kind: string }) => b.kind === "body").params[0];
    expect(mass).toMatchObject({ key: "mass", change: "changed", delta: 600 });
    expect(mass.from.value.text).toBe("1500 kg");
    expect(mass.to.value.text).toBe("2100 kg");
    const rolling = diff.ledger.find((r: { key: string }) => r.key === "rolling");
    expect(rolling.to_j / rolling.from_j).toBeCloseTo(2100 / 1500, 10);
    expect(diff.waterfall[0].key).toBe("total_a");
    expect(diff.traces.length).toBeGreaterThan(0);
  });

  it("to=live compares with the document as it is now; unknown versions are 404, a missing from is 422", async () => {
    const documentId = await vanDocument(team);
    const v1 = (await saveVersion(team, documentId, team.editor, "v1")).body.version;
    await editLive(documentId, (doc) => removeBlock(doc, readBlocks(doc).find((b) => b.kind === "note")!.id));
    const { diff } = await bodyOf(await call(diffRoute.GET, "GET", `/?from=${v1.id}&to=live`, { cookie: team.reviewer.cookie, params: params(team, documentId) }));
    expect(diff.counts.removed).toBe(1);
    expect(diff.to).toBe("Live document");
    const missing = await call(diffRoute.GET, "GET", `/?from=00000000-0000-4000-8000-000000000000&to=live`, { cookie: team.reviewer.cookie, params: params(team, documentId) });
    expect(missing.status).toBe(404);
    expect((await call(diffRoute.GET, "GET", `/?to=live`, { cookie: team.reviewer.cookie, params: params(team, documentId) })).status).toBe(422);
    const other = await vanDocument(team);
    const elsewhere = await call(diffRoute.GET, "GET", `/?from=${v1.id}&to=live`, { cookie: team.reviewer.cookie, params: params(team, other) });
    expect(elsewhere.status).toBe(404);
  });
});

describe("restore", () => {
  it("restoring v1 appends one forward update; the live document equals v1 again and v2 is kept", async () => {
    const documentId = await vanDocument(team);
    const v1 = (await saveVersion(team, documentId, team.editor, "v1")).body.version;
    await editLive(documentId, setMass("2100 kg"));
    await editLive(documentId, (doc) => removeBlock(doc, readBlocks(doc).find((b) => b.kind === "engine")!.id));
    await saveVersion(team, documentId, team.editor, "v2");
    const rowsBefore = await countDocumentUpdates({ documentId });
    const res = await call(restoreRoute.POST, "POST", "/", { cookie: team.editor.cookie, params: params(team, documentId, { versionId: v1.id }) });
    expect(res.status).toBe(200);
    expect(await bodyOf(res)).toMatchObject({ changed: true });
    expect(await countDocumentUpdates({ documentId })).toBe(rowsBefore + 1);
    const one = await bodyOf(await call(versionRoute.GET, "GET", "/", { cookie: team.editor.cookie, params: params(team, documentId, { versionId: v1.id }) }));
    expect(await liveSnapshot(documentId)).toEqual(one.version.snapshot);
    const list = await bodyOf(await call(versionsRoute.GET, "GET", "/", { cookie: team.editor.cookie, params: params(team, documentId) }));
    expect(list.versions).toHaveLength(2);
    // restoring again changes nothing
    const again = await call(restoreRoute.POST, "POST", "/", { cookie: team.editor.cookie, params: params(team, documentId, { versionId: v1.id }) });
    expect(await bodyOf(again)).toMatchObject({ changed: false });
    expect(await countDocumentUpdates({ documentId })).toBe(rowsBefore + 1);
  });

  it("reviewers and viewers cannot restore", async () => {
    const documentId = await vanDocument(team);
    const v1 = (await saveVersion(team, documentId, team.editor, "v1")).body.version;
    for (const who of [team.reviewer, team.viewer]) {
      const res = await call(restoreRoute.POST, "POST", "/", { cookie: who.cookie, params: params(team, documentId, { versionId: v1.id }) });
      expect(res.status).toBe(403);
    }
  });
});
