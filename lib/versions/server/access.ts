// The caller's right on a document of a workspace: non-members and documents of other
// workspaces → 404 (ids do not leak), members without the right → 403.
import type { Membership } from "@/db/memberships";
import { getWorkspaceDocument, type DocumentListRow } from "@/db/documents";
import { getVersion } from "@/db/versions";
import { authorizeWorkspace, isUuid, type Action } from "@/lib/authz";
import { Conflict, NotFound } from "@/lib/http/errors";

export interface DocumentAccess {
  document: DocumentListRow;
  membership: Membership;
}

export async function authorizeDocument(args: { userId: string; workspaceId: string; documentId: string; action: Action }): Promise<DocumentAccess> {
  const membership = await authorizeWorkspace({ userId: args.userId, workspaceId: args.workspaceId, action: args.action });
  const document = isUuid(args.documentId) ? await getWorkspaceDocument({ workspaceId: args.workspaceId, documentId: args.documentId }) : null;
  if (!document) throw new NotFound("document not found");
  return { document, membership };
}

export function assertWritable(document: DocumentListRow): void {
  if (document.archivedAt) throw new Conflict("this document is archived; unarchive it first");
}

export async function requireVersion(args: { documentId: string; versionId: string }) {
  const version = isUuid(args.versionId) ? await getVersion(args) : null;
  if (!version) throw new NotFound("version not found");
  return version;
}
