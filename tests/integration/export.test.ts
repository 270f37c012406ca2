// Exports of a document's current state and of a saved version: traces CSV, Scenario + Result
// JSON, charts as SVG and PNG rendered on the server, the printable review summary; also with an
// API token, and with a drive cycle taken from the team library.
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import * as Y from "yjs";
import * as tracesRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/export/traces/route";
import * as jsonRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/export/json/route";
import * as chartRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/export/charts/[chart]/route";
import * as summaryRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/export/summary/route";
import * as libraryRoute from "@/app/api/workspaces/[workspaceId]/library/route";
import * as tokensRoute from "@/app/api/tokens/route";
import { getDb } from "@/db/client";
import { documents, documentSnapshots } from "@/db/schema-documents";
import { versions } from "@/db/schema-versions";
import { evaluateScenarioInput } from "@/lib/engine";
import { compile, createScenarioDoc, readDoc, setParam } from "@/lib/notebook";
import { saveVersion } from "@/lib/versions/server/versions";
import { bodyOf, call } from "./support/http";
import { teamWorkspace } from "./support/users";

type Team = Awaited<ReturnType<typeof teamWorkspace>>;

async function newDocument(t: Team, edit?: (doc: Y.Doc) => void) {
  const doc = createScenarioDoc("bev", "Van <BEV>", new Y.Doc());
  edit?.(doc);
  const [row] = await getDb().insert(documents).values({ workspaceId: t.workspaceId, name: "Van <BEV>", powertrain: "bev" }).returning({ id: documents.id });
  await getDb().insert(documentSnapshots).values({ documentId: row.id, state: Y.encodeStateAsUpdate(doc) });
  return { id: row.id, doc };
}

const params = (t: Team, documentId: string, extra: Record<string, string> = {}) => ({ workspaceId: t.workspaceId, documentId, ...extra });
const get = (handler: Parameters<typeof call>[0], t: Team, documentId: string, o: { cookie?: string; query?: string; chart?: string; headers?: Record<string, string> } = {}) =>
  call(handler, "GET", `/api/workspaces/${t.workspaceId}/documents/${documentId}/export/x${o.query ?? ""}`, {
    cookie: o.cookie, headers: o.headers, params: params(t, documentId, o.chart ? { chart: o.chart } : {}),
  });

describe("exports", () => {
  it("traces CSV and the JSON bundle of the current draft agree with a fresh evaluation", async () => {
    const t = await teamWorkspace();
    const d = await newDocument(t);
    const expected = evaluateScenarioInput(compile(readDoc(d.doc)).scenario);
    if (!expected.ok) throw new Error("template does not evaluate");
    const csv = await get(tracesRoute.GET, t, d.id, { cookie: t.viewer.cookie });
    expect(csv.status).toBe(200);
    expect(csv.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(csv.headers.get("content-disposition")).toBe('attachment; filename="Van-BEV-traces.csv"');
    const rows = Papa.parse<string[]>(await csv.text(), { comments: "#", skipEmptyLines: true }).data;
    expect(rows.length - 1).toBe(expected.result.traces.time_s.length);
    const json = await bodyOf(await get(jsonRoute.GET, t, d.id, { cookie: t.viewer.cookie }));
    expect(json.format).toBe("joulebook.export/1");
    expect(json.result.kpi).toEqual(expected.result.kpi);
    const again = evaluateScenarioInput(json.scenario);
    expect(again.ok && again.result.kpi).toEqual(expected.result.kpi);
  });

  it("charts come as SVG and PNG; an unknown chart is 404", async () => {
    const t = await teamWorkspace();
    const d = await newDocument(t);
    const svg = await get(chartRoute.GET, t, d.id, { cookie: t.viewer.cookie, chart: "ledger.svg" });
    expect(svg.headers.get("content-type")).toBe("image/svg+xml; charset=utf-8");
    expect((await svg.text()).startsWith("<svg")).toBe(true);
    const png = await get(chartRoute.GET, t, d.id, { cookie: t.viewer.cookie, chart: "speed.png" });
    expect(png.headers.get("content-type")).toBe("image/png");
    const bytes = new Uint8Array(await png.arrayBuffer());
    expect([...bytes.slice(1, 4)].map((b) => String.fromCharCode(b)).join("")).toBe("PNG");
    expect((await get(chartRoute.GET, t, d.id, { cookie: t.viewer.cookie, chart: "spec.json" })).status).toBe(404);
  });

  it("the review summary of a saved version shows its label, escaped title, notes and cautions; no scripts allowed", async () => {
    const t = await teamWorkspace();
    const d = await newDocument(t, (doc) => {
      const body = readDoc(doc).blocks.find((b) => b.kind === "body")!;
      const note = (doc.getArray("blocks").toArray().find((b) => (b as Y.Map<unknown>).get("id") === body.id) as Y.Map<unknown>).get("note") as Y.Text;
      note.insert(0, "c_r from the tyre label <b>class B</b>");
    });
    const scenario = compile(readDoc(d.doc)).scenario!;
    const [v] = await getDb().insert(versions).values({ documentId: d.id, number: 1, name: "baseline", yjsState: Y.encodeStateAsUpdate(d.doc), scenario }).returning({ id: versions.id });
    const res = await get(summaryRoute.GET, t, d.id, { cookie: t.reviewer.cookie, query: `?version=${v.id}` });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-security-policy")).toContain("default-src 'none'");
    const html = await res.text();
    expect(html).toContain("version 1 — baseline");
    expect(html).toContain("Van &lt;BEV&gt;");
    expect(html).toContain("c_r from the tyre label &lt;b&gt;class B&lt;/b&gt;");
    expect(html).toContain("not type-approval or certification figures");
    const [broken] = await getDb().insert(versions).values({ documentId: d.id, number: 2, name: "broken", yjsState: new Uint8Array([0, 0]), scenario: null, problems: ["the bev needs a battery pack block"] }).returning({ id: versions.id });
    const refused = await get(jsonRoute.GET, t, d.id, { cookie: t.viewer.cookie, query: `?version=${broken.id}` });
    expect(refused.status).toBe(409);
    expect(await bodyOf(refused)).toEqual({ error: "version 2 — broken has no scenario: it did not compile when it was saved", problems: ["the bev needs a battery pack block"] });
  });

  it("works with an API token of the workspace; other workspaces and outsiders get 404", async () => {
    const t = await teamWorkspace();
    const other = await teamWorkspace();
    const d = await newDocument(t);
    const token = (await bodyOf(await call(tokensRoute.POST, "POST", "/api/tokens", { cookie: t.viewer.cookie, body: { workspaceId: t.workspaceId, name: "ci", role: "viewer" } }))).token;
    expect((await get(tracesRoute.GET, t, d.id, { headers: { authorization: `Bearer ${token}` } })).status).toBe(200);
    const foreignToken = (await bodyOf(await call(tokensRoute.POST, "POST", "/api/tokens", { cookie: other.owner.cookie, body: { workspaceId: other.workspaceId, name: "ci", role: "viewer" } }))).token;
    expect((await get(tracesRoute.GET, t, d.id, { headers: { authorization: `Bearer ${foreignToken}` } })).status).toBe(404);
    expect((await get(tracesRoute.GET, t, d.id, { cookie: t.outsider.cookie })).status).toBe(404);
  });

  it("a document whose drive cycle comes from the library exports the uploaded samples", async () => {
    const t = await teamWorkspace();
    const text = "time [s],speed [km/h]\n0,0\n10,36\n20,36\n30,0\n";
    const confirmation = { delimiter: ",", decimal: ".", header_rows: 1, time: { column: 1, unit: "s" }, speed: { column: 2, unit: "km/h" }, grade: null };
    const saved = await call(libraryRoute.POST, "POST", "/", { cookie: t.editor.cookie, body: { kind: "cycle", text, confirmation, name: "Depot" }, params: { workspaceId: t.workspaceId } });
    const { item } = await bodyOf(saved);
    const d = await newDocument(t, (doc) => {
      const cycle = readDoc(doc).blocks.find((b) => b.kind === "drive_cycle")!;
      setParam(doc, cycle.id, "source", "library");
      setParam(doc, cycle.id, "library_id", item.id);
    });
    const json = await bodyOf(await get(jsonRoute.GET, t, d.id, { cookie: t.viewer.cookie }));
    expect(json.scenario.cycle).toEqual({ dt_s: 10, speed_kmh: [0, 36, 36, 0] });
    // 50 + 100 + 50 m of trapezoids
    expect(json.result.kpi.distance_km).toBeCloseTo(0.2, 12);
    // a saved version keeps the resolved samples in its Scenario (versions compile with the library too)
    const version = await saveVersion({ userId: t.editor.id, workspaceId: t.workspaceId, documentId: d.id, name: "with depot cycle", message: "" });
    expect(version.problems).toEqual([]);
    const fromVersion = await bodyOf(await get(jsonRoute.GET, t, d.id, { cookie: t.viewer.cookie, query: `?version=${version.id}` }));
    expect(fromVersion.scenario.cycle).toEqual({ dt_s: 10, speed_kmh: [0, 36, 36, 0] });
  });
});
