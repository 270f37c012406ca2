import { and, asc, eq, inArray } from "drizzle-orm";
import * as Y from "yjs";
import { getDb } from "./pool";
import { documents, documentSnapshots, documentUpdates } from "./schema-documents";

export type StoredDocumentState = { id: string; name: string; archived: boolean; state: Uint8Array | null };

/**
 * Every document of a workspace with its current Yjs state (snapshot merged with the update rows
 * not yet compacted), for reading which library items its blocks refer to.
 */
export async function loadWorkspaceDocumentStates(args: { workspaceId: string; documentIds?: string[] }): Promise<StoredDocumentState[]> {
  const db = getDb();
  const inWorkspace = eq(documents.workspaceId, args.workspaceId);
  const docs = await db.select({ id: documents.id, name: documents.name, archivedAt: documents.archivedAt })
    .from(documents).where(args.documentIds ? and(inWorkspace, inArray(documents.id, args.documentIds)) : inWorkspace).orderBy(asc(documents.name));
  if (docs.length === 0) return [];
  const ids = docs.map((d) => d.id);
  const [snaps, updates] = await Promise.all([
    db.select({ documentId: documentSnapshots.documentId, state: documentSnapshots.state }).from(documentSnapshots).where(inArray(documentSnapshots.documentId, ids)),
    db.select({ documentId: documentUpdates.documentId, update: documentUpdates.update }).from(documentUpdates)
      .where(inArray(documentUpdates.documentId, ids)).orderBy(asc(documentUpdates.seq)),
  ]);
  const parts = new Map<string, Uint8Array[]>();
  for (const s of snaps) parts.set(s.documentId, [s.state]);
  for (const u of updates) parts.set(u.documentId, [...(parts.get(u.documentId) ?? []), u.update]);
  return docs.map((d) => {
    const p = parts.get(d.id);
    return { id: d.id, name: d.name, archived: d.archivedAt !== null, state: p && p.length > 0 ? Y.mergeUpdates(p) : null };
  });
}
