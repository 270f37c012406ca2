// GET: the workspace's documents (search, sort, archived or not). POST: a new document from the
// template of a powertrain (lib/notebook), stored as its first snapshot.
import { createDocumentFromDoc } from "@/db/document-updates";
import { getWorkspaceDocument, listDocuments } from "@/db/documents";
import { latestRoundStates } from "@/db/reviews";
import { authorizeWorkspace } from "@/lib/authz";
import { Unprocessable } from "@/lib/http/errors";
import { fieldMessages, json, route } from "@/lib/http/route";
import { createScenarioDoc } from "@/lib/notebook";
import { createDocumentSchema, listDocumentsQuerySchema } from "@/lib/schemas/documents";
import { documentJson } from "./access";

type Params = { workspaceId: string };

export const GET = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  await authorizeWorkspace({ userId: user.id, workspaceId: ctx.params.workspaceId, action: "document.read" });
  const parsed = listDocumentsQuerySchema.safeParse(Object.fromEntries(new URL(ctx.request.url).searchParams));
  if (!parsed.success) throw new Unprocessable(fieldMessages(parsed.error.issues), "the query string is not valid");
  const q = parsed.data;
  // Names read A→Z, figures and powertrains ascending, the most recently edited first.
  const direction = q.dir ?? (q.sort === "updated" ? "desc" : "asc");
  const rows = await listDocuments({
    workspaceId: ctx.params.workspaceId, query: q.q || undefined, archived: q.archived === "1", sort: q.sort, direction, kpiKey: q.kpi,
  });
  const reviews = await latestRoundStates({ documentIds: rows.map((r) => r.id) });
  const review = (id: string) => {
    const r = reviews.get(id);
    return r ? { state: r.state, versionNumber: r.versionNumber } : null;
  };
  return json({ documents: rows.map((r) => ({ ...documentJson(r), review: review(r.id) })) });
});

export const POST = route<Params, typeof createDocumentSchema>({ body: createDocumentSchema }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  await authorizeWorkspace({ userId: user.id, workspaceId: ctx.params.workspaceId, action: "document.create" });
  const ydoc = createScenarioDoc(body.powertrain, body.name);
  const row = await createDocumentFromDoc({ workspaceId: ctx.params.workspaceId, name: body.name, powertrain: body.powertrain, createdBy: user.id, ydoc });
  ydoc.destroy();
  const created = await getWorkspaceDocument({ workspaceId: ctx.params.workspaceId, documentId: row.id });
  return json({ document: documentJson(created!) }, 201);
});
