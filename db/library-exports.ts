import { and, eq } from "drizzle-orm";
import { getDb } from "./pool";
import { workspaces } from "./schema";
import { documents } from "./schema-documents";
import { versions } from "./schema-versions";
import { loadWorkspaceDocumentStates } from "./library-usage";

export async function getWorkspaceName(args: { workspaceId: string }): Promise<string> {
  const [row] = await getDb().select({ name: workspaces.name }).from(workspaces).where(eq(workspaces.id, args.workspaceId)).limit(1);
  return row?.name ?? "";
}

/** The document (if it belongs to the workspace) with its current Yjs state. */
export async function getDocumentForExport(args: { workspaceId: string; documentId: string }): Promise<{ id: string; name: string; state: Uint8Array | null } | null> {
  const [doc] = await getDb().select({ id: documents.id }).from(documents)
    .where(and(eq(documents.id, args.documentId), eq(documents.workspaceId, args.workspaceId))).limit(1);
  if (!doc) return null;
  const all = await loadWorkspaceDocumentStates({ workspaceId: args.workspaceId, documentIds: [args.documentId] });
  return all[0] ?? null;
}

export async function getVersionForExport(args: { documentId: string; versionId: string }) {
  const [row] = await getDb().select({
    id: versions.id, number: versions.number, name: versions.name, scenario: versions.scenario, yjsState: versions.yjsState, problems: versions.problems,
  }).from(versions).where(and(eq(versions.id, args.versionId), eq(versions.documentId, args.documentId))).limit(1);
  return row ?? null;
}
