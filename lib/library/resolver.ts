import "server-only";
// Server-side resolution of library references before compile (compile itself stays pure).
import { getLibraryItemsData } from "@/db/library";
import { isUuid } from "@/lib/authz";
import type { BlockSnapshot, LibraryResolver } from "@/lib/notebook";
import { LIBRARY_KIND_LABELS } from "./kinds";
import { libraryReferences } from "./references";

export async function libraryResolverFor(args: { workspaceId: string; blocks: readonly BlockSnapshot[] }): Promise<LibraryResolver> {
  const ids = libraryReferences(args.blocks).filter(isUuid);
  const items = new Map((await getLibraryItemsData({ workspaceId: args.workspaceId, itemIds: ids })).map((i) => [i.id, i]));
  return (id) => {
    const item = items.get(id);
    if (!item) return `no item "${id}" in this workspace's library (deleted, or from another workspace)`;
    if (item.kind !== "cycle") return `"${item.name}" is a ${LIBRARY_KIND_LABELS[item.kind].toLowerCase()}, not a drive cycle`;
    return item.data as { dt_s: number; speed_kmh: number[]; grade_pct?: number[] };
  };
}
