// POST {name?}: a copy of the document's current state (snapshot + updates) as a new document.
import { createDocumentFromDoc, loadDocumentState } from "@/db/document-updates";
import { getWorkspaceDocument } from "@/db/documents";
import { authorizeWorkspace } from "@/lib/authz";
import { json, route } from "@/lib/http/route";
import { setMeta } from "@/lib/notebook";
import { duplicateDocumentSchema } from "@/lib/schemas/documents";
import * as Y from "yjs";
import { authorizeDocument, documentJson } from "../../access";

type Params = { workspaceId: string; documentId: string };

export const POST = route<Params, typeof duplicateDocumentSchema>({ body: duplicateDocumentSchema }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  const { document } = await authorizeDocument({ userId: user.id, ...ctx.params, action: "document.read" });
  await authorizeWorkspace({ userId: user.id, workspaceId: ctx.params.workspaceId, action: "document.create" });
  const name = body.name ?? copyName(document.name);
  const ydoc = new Y.Doc();
  Y.applyUpdate(ydoc, await loadDocumentState({ documentId: document.id }));
  setMeta(ydoc, { name });
  const row = await createDocumentFromDoc({
    workspaceId: ctx.params.workspaceId, name, powertrain: document.powertrain, createdBy: user.id, ydoc, summary: document.summary,
  });
  ydoc.destroy();
  const created = await getWorkspaceDocument({ workspaceId: ctx.params.workspaceId, documentId: row.id });
  return json({ document: documentJson(created!) }, 201);
});

function copyName(name: string): string {
  const copy = `${name} (copy)`;
  return copy.length <= 120 ? copy : `${name.slice(0, 113)} (copy)`;
}
