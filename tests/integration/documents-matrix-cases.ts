// Rows of the authorization matrix (authz-matrix.test.ts) for the documents API. Expected statuses
// from the product rules (DESIGN §1, issue 5 §6): everyone in the workspace reads documents;
// editors and owners create, rename, duplicate, archive and write the summary; reviewers and
// viewers get 403; non-members 404; signed out 401.
import * as archiveRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/archive/route";
import * as duplicateRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/duplicate/route";
import * as documentRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/route";
import * as summaryRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/summary/route";
import * as unarchiveRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/unarchive/route";
import * as documentsRoute from "@/app/api/workspaces/[workspaceId]/documents/route";
import { createDocumentFromDoc } from "@/db/document-updates";
import { setDocumentArchived } from "@/db/documents";
import { createScenarioDoc } from "@/lib/notebook";
import { call } from "./support/http";

type Setup = { workspaceId: string; caller: { id: string; cookie: string } | null; ownerId: string };
type Who = "owner" | "editor" | "reviewer" | "viewer" | "outsider" | "signedOut";
type Case = { name: string; send(s: Setup): Promise<Response>; expected: Record<Who, number> };

const readAll = { owner: 200, editor: 200, reviewer: 200, viewer: 200, outsider: 404, signedOut: 401 };
const editors = (ok: number) => ({ owner: ok, editor: ok, reviewer: 403, viewer: 403, outsider: 404, signedOut: 401 });

async function documentOf(s: Setup, archived = false): Promise<{ workspaceId: string; documentId: string }> {
  const ydoc = createScenarioDoc("bev", "Matrix document");
  const row = await createDocumentFromDoc({ workspaceId: s.workspaceId, name: "Matrix document", powertrain: "bev", createdBy: s.ownerId, ydoc });
  ydoc.destroy();
  if (archived) await setDocumentArchived({ documentId: row.id, archived: true });
  return { workspaceId: s.workspaceId, documentId: row.id };
}

const W = "/api/workspaces/:workspaceId/documents";
const D = `${W}/:documentId`;
const cookie = (s: Setup) => s.caller?.cookie;

export const DOCUMENT_ROUTES: Case[] = [
  { name: `GET ${W}`, expected: readAll, send: (s) => call(documentsRoute.GET, "GET", "/", { cookie: cookie(s), params: { workspaceId: s.workspaceId } }) },
  {
    name: `POST ${W}`, expected: editors(201),
    send: (s) => call(documentsRoute.POST, "POST", "/", { cookie: cookie(s), params: { workspaceId: s.workspaceId }, body: { name: "New", powertrain: "series" } }),
  },
  { name: `GET ${D}`, expected: readAll, send: async (s) => call(documentRoute.GET, "GET", "/", { cookie: cookie(s), params: await documentOf(s) }) },
  {
    name: `PATCH ${D}`, expected: editors(200),
    send: async (s) => call(documentRoute.PATCH, "PATCH", "/", { cookie: cookie(s), params: await documentOf(s), body: { name: "Renamed" } }),
  },
  {
    name: `POST ${D}/duplicate`, expected: editors(201),
    send: async (s) => call(duplicateRoute.POST, "POST", "/", { cookie: cookie(s), params: await documentOf(s), body: {} }),
  },
  {
    name: `POST ${D}/archive`, expected: editors(200),
    send: async (s) => call(archiveRoute.POST, "POST", "/", { cookie: cookie(s), params: await documentOf(s) }),
  },
  {
    name: `POST ${D}/unarchive`, expected: editors(200),
    send: async (s) => call(unarchiveRoute.POST, "POST", "/", { cookie: cookie(s), params: await documentOf(s, true) }),
  },
  {
    name: `PUT ${D}/summary`, expected: editors(200),
    send: async (s) => call(summaryRoute.PUT, "PUT", "/", { cookie: cookie(s), params: await documentOf(s), body: { kpi: { fuel_l_per_100km: 6.1 } } }),
  },
];
