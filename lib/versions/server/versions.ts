// Saving, reading, diffing and restoring versions. The server computes everything a version
// stores from the document's own state in PostgreSQL; nothing client-computed is trusted.
import * as Y from "yjs";
import { appendDocumentUpdate, loadDocumentState } from "@/db/document-updates";
import { insertVersion, listVersions, type VersionListItem } from "@/db/versions";
import type { DocSnapshot } from "@/lib/notebook";
import { NotFound } from "@/lib/http/errors";
import { docFromState, snapshotOfState, versionContent } from "../content";
import { libraryResolverFor } from "@/lib/library/resolver";
import { diffVersions } from "../diff";
import { applySnapshot } from "../restore";
import type { NotebookDiff, ResultSummary, VersionSide } from "../types";
import { assertNotArchived, authorizeDocument, requireVersion } from "./access";
import { pushUpdateToCollab } from "./collab-push";

type DocArgs = { userId: string; workspaceId: string; documentId: string };

export interface VersionJson {
  id: string;
  number: number;
  name: string;
  message: string;
  author: { id: string; name: string } | null;
  createdAt: string;
  kpi: VersionListItem["kpi"];
  problems: string[];
}

export interface VersionDetailJson extends VersionJson {
  snapshot: DocSnapshot;
  scenario: Record<string, unknown> | null;
  summary: ResultSummary | null;
}

function versionJson(v: Omit<VersionListItem, "kpi"> & { kpi: VersionListItem["kpi"] }): VersionJson {
  return {
    id: v.id, number: v.number, name: v.name, message: v.message,
    author: v.authorId && v.authorName !== null ? { id: v.authorId, name: v.authorName } : null,
    createdAt: v.createdAt.toISOString(), kpi: v.kpi, problems: v.problems,
  };
}

export async function saveVersion(args: DocArgs & { name: string; message: string }): Promise<VersionJson> {
  const { document } = await authorizeDocument({ ...args, action: "version.save" });
  assertNotArchived(document);
  const state = await loadDocumentState({ documentId: args.documentId });
  const snapshot = snapshotOfState(state);
  const content = versionContent(snapshot, await libraryResolverFor({ workspaceId: args.workspaceId, blocks: snapshot.blocks }));
  const row = await insertVersion({
    documentId: args.documentId, name: args.name, message: args.message, authorId: args.userId, yjsState: state,
    scenario: content.scenario, resultSummary: content.summary, problems: content.problems,
  });
  const listed = (await listVersions({ documentId: args.documentId })).find((v) => v.id === row.id)!;
  return versionJson(listed);
}

export async function readVersions(args: DocArgs): Promise<VersionJson[]> {
  await authorizeDocument({ ...args, action: "version.read" });
  return (await listVersions({ documentId: args.documentId })).map(versionJson);
}

export async function readVersion(args: DocArgs & { versionId: string }): Promise<VersionDetailJson> {
  await authorizeDocument({ ...args, action: "version.read" });
  const v = await requireVersion(args);
  return {
    ...versionJson({ ...v, kpi: v.resultSummary?.kpi ?? null }),
    snapshot: snapshotOfState(v.yjsState),
    scenario: v.scenario ?? null,
    summary: v.resultSummary ?? null,
  };
}

/** One side of a diff: a stored version (no engine run) or "live" (compiled and evaluated now). */
async function sideOf(documentId: string, ref: string, workspaceId: string): Promise<VersionSide & { ref: string }> {
  if (ref === "live") {
    const snapshot = snapshotOfState(await loadDocumentState({ documentId }));
    const content = versionContent(snapshot, await libraryResolverFor({ workspaceId, blocks: snapshot.blocks }));
    return { ref, label: "Live document", doc: content.snapshot, summary: content.summary };
  }
  const v = await requireVersion({ documentId, versionId: ref }).catch(() => {
    throw new NotFound(`version "${ref}" not found in this document`);
  });
  return { ref, label: `v${v.number} · ${v.name}`, doc: snapshotOfState(v.yjsState), summary: v.resultSummary ?? null };
}

export async function diffRefs(args: DocArgs & { from: string; to: string }): Promise<NotebookDiff & { fromRef: string; toRef: string }> {
  await authorizeDocument({ ...args, action: "version.read" });
  const [a, b] = await Promise.all([sideOf(args.documentId, args.from, args.workspaceId), sideOf(args.documentId, args.to, args.workspaceId)]);
  return { ...diffVersions(a, b), fromRef: a.ref, toRef: b.ref };
}

/**
 * Restore = one forward change on the live document: the stored state is loaded, changed to
 * the version's content on a server-side Y.Doc, and the difference is appended as an ordinary
 * update row and pushed to the collaboration server for connected clients. Returns whether
 * anything changed.
 */
export async function restoreVersion(args: DocArgs & { versionId: string }): Promise<{ changed: boolean; deliveredLive: boolean }> {
  const { document } = await authorizeDocument({ ...args, action: "document.edit" });
  await authorizeDocument({ ...args, action: "version.save" });
  assertNotArchived(document);
  const version = await requireVersion(args);
  const target = snapshotOfState(version.yjsState);
  const live = docFromState(await loadDocumentState({ documentId: args.documentId }));
  try {
    // Collect what the transaction emits: encodeStateAsUpdate(doc, vector) would also carry the
    // whole delete set, so it is never empty once anything was ever deleted.
    const emitted: Uint8Array[] = [];
    live.on("update", (u: Uint8Array) => emitted.push(u));
    applySnapshot(live, target, "restore");
    if (emitted.length === 0) return { changed: false, deliveredLive: false };
    const update = Y.mergeUpdates(emitted);
    await appendDocumentUpdate({ documentId: args.documentId, update });
    const deliveredLive = await pushUpdateToCollab({ documentId: args.documentId, update });
    return { changed: true, deliveredLive };
  } finally {
    live.destroy();
  }
}
