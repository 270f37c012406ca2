// Shared by the documents route handlers: the caller's right on a document and the JSON shape.
import { getWorkspaceDocument, type DocumentListRow } from "@/db/documents";
import { authorizeWorkspace, isUuid, type Action } from "@/lib/authz";
import type { Membership } from "@/db/memberships";
import { Conflict, NotFound } from "@/lib/http/errors";

export type DocumentJson = {
  id: string;
  name: string;
  powertrain: DocumentListRow["powertrain"];
  createdAt: string;
  updatedAt: string;
  createdBy: { id: string; name: string } | null;
  archived: boolean;
  archivedAt: string | null;
  summary: DocumentListRow["summary"];
};

export function documentJson(row: DocumentListRow): DocumentJson {
  return {
    id: row.id,
    name: row.name,
    powertrain: row.powertrain,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    createdBy: row.createdBy && row.createdByName !== null ? { id: row.createdBy, name: row.createdByName } : null,
    archived: row.archivedAt !== null,
    archivedAt: row.archivedAt?.toISOString() ?? null,
    summary: row.summary,
  };
}

/**
 * The document when the caller may do `action` on it: non-members and documents of other
 * workspaces → 404 (ids do not leak), members without the right → 403.
 */
export async function authorizeDocument(args: {
  userId: string;
  workspaceId: string;
  documentId: string;
  action: Action;
}): Promise<{ document: DocumentListRow; membership: Membership }> {
  const membership = await authorizeWorkspace({ userId: args.userId, workspaceId: args.workspaceId, action: args.action });
  const document = isUuid(args.documentId) ? await getWorkspaceDocument({ workspaceId: args.workspaceId, documentId: args.documentId }) : null;
  if (!document) throw new NotFound("document not found");
  return { document, membership };
}

/** Archived documents are read-only until unarchived. */
export function assertNotArchived(document: DocumentListRow): void {
  if (document.archivedAt) throw new Conflict("this document is archived; unarchive it first");
}
