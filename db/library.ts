import { and, desc, eq, inArray } from "drizzle-orm";
import { getDb } from "./pool";
import { users } from "./schema";
import { libraryItems } from "./schema-library";
import type { LibraryKind } from "@/lib/library/kinds";

export type LibraryItemMeta = {
  id: string;
  kind: LibraryKind;
  name: string;
  sourceNote: string;
  summary: unknown;
  uploadedBy: { id: string; name: string } | null;
  createdAt: Date;
};

const metaColumns = {
  id: libraryItems.id, kind: libraryItems.kind, name: libraryItems.name, sourceNote: libraryItems.sourceNote,
  summary: libraryItems.summary, createdAt: libraryItems.createdAt, uploaderId: users.id, uploaderName: users.name,
};

type MetaRow = { id: string; kind: LibraryKind; name: string; sourceNote: string; summary: unknown; createdAt: Date; uploaderId: string | null; uploaderName: string | null };
const toMeta = (r: MetaRow): LibraryItemMeta => ({
  id: r.id, kind: r.kind, name: r.name, sourceNote: r.sourceNote, summary: r.summary, createdAt: r.createdAt,
  uploadedBy: r.uploaderId ? { id: r.uploaderId, name: r.uploaderName ?? "" } : null,
});

export async function listLibraryItems(args: { workspaceId: string }): Promise<LibraryItemMeta[]> {
  const rows = await getDb().select(metaColumns).from(libraryItems)
    .leftJoin(users, eq(users.id, libraryItems.uploadedBy))
    .where(eq(libraryItems.workspaceId, args.workspaceId))
    .orderBy(desc(libraryItems.createdAt));
  return rows.map(toMeta);
}

export async function getLibraryItem(args: { workspaceId: string; itemId: string }): Promise<(LibraryItemMeta & { data: unknown }) | null> {
  const [row] = await getDb().select({ ...metaColumns, data: libraryItems.data }).from(libraryItems)
    .leftJoin(users, eq(users.id, libraryItems.uploadedBy))
    .where(and(eq(libraryItems.workspaceId, args.workspaceId), eq(libraryItems.id, args.itemId)))
    .limit(1);
  return row ? { ...toMeta(row), data: row.data } : null;
}

/** Items of a workspace by id (for resolving references); ids of other workspaces are not returned. */
export async function getLibraryItemsData(args: { workspaceId: string; itemIds: string[] }): Promise<{ id: string; kind: LibraryKind; name: string; data: unknown }[]> {
  if (args.itemIds.length === 0) return [];
  const rows = await getDb().select({ id: libraryItems.id, kind: libraryItems.kind, name: libraryItems.name, data: libraryItems.data })
    .from(libraryItems).where(and(eq(libraryItems.workspaceId, args.workspaceId), inArray(libraryItems.id, args.itemIds)));
  return rows;
}

export async function insertLibraryItem(args: {
  workspaceId: string; kind: LibraryKind; name: string; sourceNote: string; data: unknown; summary: unknown; uploadedBy: string;
}): Promise<string> {
  const [row] = await getDb().insert(libraryItems).values(args).returning({ id: libraryItems.id });
  return row.id;
}

export async function deleteLibraryItem(args: { workspaceId: string; itemId: string }): Promise<boolean> {
  const rows = await getDb().delete(libraryItems)
    .where(and(eq(libraryItems.workspaceId, args.workspaceId), eq(libraryItems.id, args.itemId)))
    .returning({ id: libraryItems.id });
  return rows.length > 0;
}
