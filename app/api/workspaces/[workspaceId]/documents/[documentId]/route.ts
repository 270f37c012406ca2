// GET: one document and the caller's role. PATCH {name?, archived?}: rename (editors) and/or
// archive / unarchive (editors). The name is also written into the document's Yjs meta and handed
// to the collaboration server for clients that have it open.
import { appendDocumentChange } from "@/db/document-updates";
import { getWorkspaceDocument, renameDocument, setDocumentArchived } from "@/db/documents";
import { can } from "@/lib/authz";
import { Forbidden } from "@/lib/http/errors";
import { json, route } from "@/lib/http/route";
import { setMeta } from "@/lib/notebook";
import { pushUpdateToCollab } from "@/lib/versions/server/collab-push";
import { patchDocumentSchema } from "@/lib/schemas/documents";
import { assertNotArchived, authorizeDocument, documentJson } from "../access";

type Params = { workspaceId: string; documentId: string };

export const GET = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  const { document, membership } = await authorizeDocument({ userId: user.id, ...ctx.params, action: "document.read" });
  return json({ document: documentJson(document), role: membership.role, canEdit: can(membership.role, "document.edit") && !document.archivedAt });
});

export const PATCH = route<Params, typeof patchDocumentSchema>({ body: patchDocumentSchema }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  const { document, membership } = await authorizeDocument({ userId: user.id, ...ctx.params, action: "document.read" });
  if (body.name !== undefined && !can(membership.role, "document.edit")) throw new Forbidden("your role in this workspace does not allow renaming documents");
  if (body.archived !== undefined && !can(membership.role, "document.delete")) throw new Forbidden("your role in this workspace does not allow archiving documents");
  // Unarchiving and renaming in one request works: archived state is applied first.
  if (body.archived !== undefined) await setDocumentArchived({ documentId: document.id, archived: body.archived });
  if (body.name !== undefined) {
    if (body.archived === undefined) assertNotArchived(document);
    await renameDocument({ documentId: document.id, name: body.name });
    const update = await appendDocumentChange({ documentId: document.id, change: (doc) => setMeta(doc, { name: body.name }) });
    // Clients with the document open get the new name now (best effort; otherwise on their next load).
    if (update) await pushUpdateToCollab({ documentId: document.id, update });
  }
  const updated = await getWorkspaceDocument({ workspaceId: ctx.params.workspaceId, documentId: document.id });
  return json({ document: documentJson(updated!) });
});
