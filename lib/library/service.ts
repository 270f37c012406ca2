import "server-only";
// The team library behind the API: authorization, re-validation of every save on the server
// (the client's preview is never trusted), usage, and refusal to delete what is in use.
import { deleteLibraryItem, getLibraryItem, insertLibraryItem, listLibraryItems, type LibraryItemMeta } from "@/db/library";
import { authorizeWorkspace, isUuid } from "@/lib/authz";
import { Conflict, NotFound } from "@/lib/http/errors";
import type { UploadInput } from "@/lib/uploads";
import { documentsUsingLibrary, type DocumentRef } from "./usage";
import { LIBRARY_KIND_BLOCKS, type LibraryKind } from "./kinds";
import { previewUpload, type UploadPreview } from "./preview";
import type { SaveRequest } from "./schemas";

export type LibraryListItem = LibraryItemMeta & { usedBy: DocumentRef[] };

export async function listLibrary(args: { userId: string; workspaceId: string }): Promise<LibraryListItem[]> {
  await authorizeWorkspace({ userId: args.userId, workspaceId: args.workspaceId, action: "library.read" });
  const [items, usage] = await Promise.all([listLibraryItems({ workspaceId: args.workspaceId }), documentsUsingLibrary({ workspaceId: args.workspaceId })]);
  return items.map((i) => ({ ...i, usedBy: usage.get(i.id) ?? [] }));
}

export async function previewForUser(args: { userId: string; workspaceId: string; kind: SaveRequest["kind"]; input: UploadInput; confirmation?: unknown }): Promise<UploadPreview> {
  await authorizeWorkspace({ userId: args.userId, workspaceId: args.workspaceId, action: "library.write" });
  return previewUpload(args.kind, args.input, args.confirmation);
}

/** Saves after validating again; a failing upload stores nothing and returns the issues. */
export async function saveToLibrary(args: { userId: string; workspaceId: string; request: SaveRequest; input: UploadInput }): Promise<{ preview: UploadPreview; id: string | null }> {
  await authorizeWorkspace({ userId: args.userId, workspaceId: args.workspaceId, action: "library.write" });
  const preview = previewUpload(args.request.kind, args.input, args.request.confirmation ?? undefined);
  if (!preview.ok) return { preview, id: null };
  const summary = { ...preview.summary, file_name: args.request.file_name ?? null, warnings: preview.warnings };
  const id = await insertLibraryItem({
    workspaceId: args.workspaceId, kind: args.request.kind, name: args.request.name, sourceNote: args.request.source_note,
    data: preview.data, summary, uploadedBy: args.userId,
  });
  return { preview, id };
}

/** The item with its data; `withUsage` also reads every document of the workspace (the notebook's fetch skips it). */
export async function readLibraryItem(args: { userId: string; workspaceId: string; itemId: string; withUsage: boolean }) {
  await authorizeWorkspace({ userId: args.userId, workspaceId: args.workspaceId, action: "library.read" });
  const item = isUuid(args.itemId) ? await getLibraryItem({ workspaceId: args.workspaceId, itemId: args.itemId }) : null;
  if (!item) throw new NotFound("no such library item in this workspace");
  if (!args.withUsage) return item;
  const usage = await documentsUsingLibrary({ workspaceId: args.workspaceId });
  return { ...item, usedBy: usage.get(item.id) ?? [] };
}

export class InUse extends Conflict {
  constructor(readonly documents: DocumentRef[], name: string, kind: LibraryKind) {
    super(`"${name}" is used by ${documents.length} document${documents.length === 1 ? "" : "s"}: ${documents.map((d) => `"${d.title}"`).join(", ")}; change their ${LIBRARY_KIND_BLOCKS[kind]} first`);
  }
  override body(): Record<string, unknown> {
    return { error: this.message, documents: this.documents };
  }
}

export async function removeLibraryItem(args: { userId: string; workspaceId: string; itemId: string }): Promise<void> {
  await authorizeWorkspace({ userId: args.userId, workspaceId: args.workspaceId, action: "library.delete" });
  const item = isUuid(args.itemId) ? await getLibraryItem({ workspaceId: args.workspaceId, itemId: args.itemId }) : null;
  if (!item) throw new NotFound("no such library item in this workspace");
  const users = (await documentsUsingLibrary({ workspaceId: args.workspaceId })).get(item.id) ?? [];
  if (users.length > 0) throw new InUse(users, item.name, item.kind);
  await deleteLibraryItem({ workspaceId: args.workspaceId, itemId: args.itemId });
}
