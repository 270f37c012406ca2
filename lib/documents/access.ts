// The caller's right on one document of a workspace, shared by the documents, versions,
// threads and reviews handlers.
import type { Membership } from "@/db/memberships";
import { getWorkspaceDocument, type DocumentListRow } from "@/db/documents";
import { authorizeWorkspace, isUuid, type Action } from "@/lib/authz";
import { Conflict, NotFound } from "@/lib/http/errors";

export interface DocumentAccess {
  document: DocumentListRow;
  membership: Membership;
}

/**
 * The document when the caller may do `action` on it: non-members and documents of other
 * workspaces → 404 (ids do not leak), members without the right → 403.
 */
export async function authorizeDocument(args: { userId: string; workspaceId: string; documentId: string; action: Action }): Promise<DocumentAccess> {
  const membership = await authorizeWorkspace({ userId: args.userId, workspaceId: args.workspaceId, action: args.action });
  const document = isUuid(args.documentId) ? await getWorkspaceDocument({ workspaceId: args.workspaceId, documentId: args.documentId }) : null;
  if (!document) throw new NotFound("document not found");
  return { document, membership };
}

/** Archived documents are read-only until unarchived. */
export function assertNotArchived(document: DocumentListRow): void {
  if (document.archivedAt) throw new Conflict("this document is archived; unarchive it first");
}
