import "server-only";
// Server-side resolution of library references before compile (compile itself stays pure and
// checks that each item is of the kind its field expects).
import { getLibraryItemsData } from "@/db/library";
import { isUuid } from "@/lib/authz";
import type { BlockSnapshot, LibraryItemData, LibraryResolver } from "@/lib/notebook";
import { libraryReferences } from "./references";

export async function libraryResolverFor(args: { workspaceId: string; blocks: readonly BlockSnapshot[] }): Promise<LibraryResolver> {
  const ids = libraryReferences(args.blocks).filter(isUuid);
  const items = new Map((await getLibraryItemsData({ workspaceId: args.workspaceId, itemIds: ids })).map((i) => [i.id, i]));
  return (id) => {
    const item = items.get(id);
    if (!item) return `no item "${id}" in this workspace's library (deleted, or from another workspace)`;
    return { kind: item.kind, name: item.name, data: item.data } as LibraryItemData;
  };
}
