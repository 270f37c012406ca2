// Browser side of library references: the notebook's live evaluation asks for the items its
// blocks name (cycles, full-load and OCV curves); this fetches each once per page and calls
// `onLoaded` so the document is evaluated again with the data. Until then the block's field
// shows that the item is loading. compile checks that each item is of the kind its field wants.
import type { LibraryItemData } from "@/lib/notebook";

export type LibraryEntry = LibraryItemData | string;

export const LIBRARY_LOADING = "loading from the library…";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

async function fetchEntry(workspaceId: string, id: string): Promise<LibraryEntry> {
  try {
    const res = await fetch(`/api/workspaces/${encodeURIComponent(workspaceId)}/library/${encodeURIComponent(id)}`, { credentials: "same-origin", headers: { accept: "application/json" } });
    if (res.status === 404) return `no item "${id}" in this workspace's library`;
    if (!res.ok) return `the library answered ${res.status}; reload to try again`;
    const { item } = (await res.json()) as { item: LibraryItemData };
    return { kind: item.kind, name: item.name, data: item.data } as LibraryItemData;
  } catch {
    return "the library could not be reached; reload to try again";
  }
}

export function createLibraryCache(workspaceId: string, onLoaded: () => void) {
  const entries = new Map<string, LibraryEntry>();
  const loading = new Set<string>();
  return {
    /** What is known now for each id; missing ones start loading. */
    lookup(ids: readonly string[]): Record<string, LibraryEntry> {
      const out: Record<string, LibraryEntry> = {};
      for (const id of ids) {
        if (!UUID.test(id)) { out[id] = `"${id}" is not a library id (choose an item from the list)`; continue; }
        const known = entries.get(id);
        if (known !== undefined) { out[id] = known; continue; }
        out[id] = LIBRARY_LOADING;
        if (loading.has(id)) continue;
        loading.add(id);
        void fetchEntry(workspaceId, id).then((entry) => { entries.set(id, entry); loading.delete(id); onLoaded(); });
      }
      return out;
    },
  };
}
