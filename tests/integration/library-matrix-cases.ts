// Rows of the authorization matrix (authz-matrix.test.ts) for the team library and the exports.
// Expected statuses from the product rules (DESIGN §1, issue 7): everyone in the workspace reads
// the library and exports documents; editors and owners upload and delete library items;
// reviewers and viewers get 403; non-members 404; signed out 401.
import * as previewRoute from "@/app/api/workspaces/[workspaceId]/library/preview/route";
import * as libraryRoute from "@/app/api/workspaces/[workspaceId]/library/route";
import * as itemRoute from "@/app/api/workspaces/[workspaceId]/library/[itemId]/route";
import * as chartRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/export/charts/[chart]/route";
import * as jsonRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/export/json/route";
import * as summaryRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/export/summary/route";
import * as tracesRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/export/traces/route";
import { createDocumentFromDoc } from "@/db/document-updates";
import { insertLibraryItem } from "@/db/library";
import { createScenarioDoc } from "@/lib/notebook";
import { call } from "./support/http";

type Setup = { workspaceId: string; caller: { id: string; cookie: string } | null; ownerId: string };
type Who = "owner" | "editor" | "reviewer" | "viewer" | "outsider" | "signedOut";
type Case = { name: string; send(s: Setup): Promise<Response>; expected: Record<Who, number> };

const readAll = { owner: 200, editor: 200, reviewer: 200, viewer: 200, outsider: 404, signedOut: 401 };
const editors = (ok: number) => ({ owner: ok, editor: ok, reviewer: 403, viewer: 403, outsider: 404, signedOut: 401 });
const cookie = (s: Setup) => s.caller?.cookie;

const CSV = "time [s],speed [km/h]\n0,0\n1,3.6\n2,0\n";
const CONFIRMATION = { delimiter: ",", decimal: ".", header_rows: 1, time: { column: 1, unit: "s" }, speed: { column: 2, unit: "km/h" }, grade: null };

async function itemOf(s: Setup) {
  const itemId = await insertLibraryItem({
    workspaceId: s.workspaceId, kind: "cycle", name: "Matrix cycle", sourceNote: "", data: { dt_s: 1, speed_kmh: [0, 3.6, 0] }, summary: { kind: "cycle" }, uploadedBy: s.ownerId,
  });
  return { workspaceId: s.workspaceId, itemId };
}

async function documentOf(s: Setup) {
  const ydoc = createScenarioDoc("bev", "Matrix export");
  const row = await createDocumentFromDoc({ workspaceId: s.workspaceId, name: "Matrix export", powertrain: "bev", createdBy: s.ownerId, ydoc });
  ydoc.destroy();
  return { workspaceId: s.workspaceId, documentId: row.id };
}

const L = "/api/workspaces/:workspaceId/library";
const E = "/api/workspaces/:workspaceId/documents/:documentId/export";

export const LIBRARY_ROUTES: Case[] = [
  { name: `GET ${L}`, expected: readAll, send: (s) => call(libraryRoute.GET, "GET", "/", { cookie: cookie(s), params: { workspaceId: s.workspaceId } }) },
  {
    name: `POST ${L}/preview`, expected: editors(200),
    send: (s) => call(previewRoute.POST, "POST", "/", { cookie: cookie(s), params: { workspaceId: s.workspaceId }, body: { kind: "cycle", text: CSV } }),
  },
  {
    name: `POST ${L}`, expected: editors(201),
    send: (s) => call(libraryRoute.POST, "POST", "/", { cookie: cookie(s), params: { workspaceId: s.workspaceId }, body: { kind: "cycle", text: CSV, confirmation: CONFIRMATION, name: "m" } }),
  },
  { name: `GET ${L}/:itemId`, expected: readAll, send: async (s) => call(itemRoute.GET, "GET", "/", { cookie: cookie(s), params: await itemOf(s) }) },
  { name: `DELETE ${L}/:itemId`, expected: editors(204), send: async (s) => call(itemRoute.DELETE, "DELETE", "/", { cookie: cookie(s), params: await itemOf(s) }) },
  { name: `GET ${E}/traces`, expected: readAll, send: async (s) => call(tracesRoute.GET, "GET", "/", { cookie: cookie(s), params: await documentOf(s) }) },
  { name: `GET ${E}/json`, expected: readAll, send: async (s) => call(jsonRoute.GET, "GET", "/", { cookie: cookie(s), params: await documentOf(s) }) },
  { name: `GET ${E}/summary`, expected: readAll, send: async (s) => call(summaryRoute.GET, "GET", "/", { cookie: cookie(s), params: await documentOf(s) }) },
  {
    name: `GET ${E}/charts/:chart`, expected: readAll,
    send: async (s) => call(chartRoute.GET, "GET", "/", { cookie: cookie(s), params: { ...(await documentOf(s)), chart: "speed.svg" } }),
  },
];
