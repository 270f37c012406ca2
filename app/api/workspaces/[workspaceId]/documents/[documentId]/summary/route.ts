// PUT {kpi, computedAt?}: the headline figures of the last recalculation, shown and sorted in the
// documents table. Written by editors' browsers after the evaluator ran; not by reviewers/viewers.
import { getWorkspaceDocument, setDocumentSummary } from "@/db/documents";
import { json, route } from "@/lib/http/route";
import { documentSummarySchema } from "@/lib/schemas/documents";
import { assertNotArchived, authorizeDocument, documentJson } from "../../access";

type Params = { workspaceId: string; documentId: string };

export const PUT = route<Params, typeof documentSummarySchema>({ body: documentSummarySchema }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  const { document } = await authorizeDocument({ userId: user.id, ...ctx.params, action: "document.edit" });
  assertNotArchived(document);
  await setDocumentSummary({ documentId: document.id, summary: { kpi: body.kpi, computedAt: body.computedAt ?? new Date().toISOString() } });
  const updated = await getWorkspaceDocument({ workspaceId: ctx.params.workspaceId, documentId: document.id });
  return json({ document: documentJson(updated!) });
});
