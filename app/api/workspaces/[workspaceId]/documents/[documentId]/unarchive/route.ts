// POST: unarchives the document (editors and owners). Archived documents leave the default list and
// open read-only; unarchiving brings them back. Repeating the call changes nothing.
import { getWorkspaceDocument, setDocumentArchived } from "@/db/documents";
import { json, route } from "@/lib/http/route";
import { authorizeDocument, documentJson } from "../../access";

type Params = { workspaceId: string; documentId: string };

export const POST = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  const { document } = await authorizeDocument({ userId: user.id, ...ctx.params, action: "document.delete" });
  await setDocumentArchived({ documentId: document.id, archived: false });
  const updated = await getWorkspaceDocument({ workspaceId: ctx.params.workspaceId, documentId: document.id });
  return json({ document: documentJson(updated!) });
});
