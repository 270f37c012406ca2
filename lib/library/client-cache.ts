// Browser side of library references: the notebook's live evaluation asks for the cycles its
// drive-cycle blocks name; this fetches each once per page and calls `onLoaded` so the document
// is evaluated again with the data. Until then the block shows that the cycle is loading.
import type { LibraryCycle } from "@/lib/notebook";

export type LibraryEntry = LibraryCycle | string;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

async function fetchEntry(workspaceId: string, id: string): Promise<LibraryEntry> {
  try {
    const res = await fetch(`/api/workspaces/${encodeURIComponent(workspaceId)}/library/${encodeURIComponent(id)}`, { credentials: "same-origin", headers: { accept: "application/json" } });
    if (res.status === 404) return `no item "${id}" in this workspace's library`;
    if (!res.ok) return `the library answered ${res.status}; reload to try again`;
    const { item } = (await res.json()) as { item: { kind: string; name: string; data: LibraryCycle } };
    return item.kind === "cycle" ? item.data : `"${item.name}" is not a drive cycle`;
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
        if (!UUID.test(id)) { out[id] = `"${id}" is not a library id (copy it from the Library page)`; continue; }
        const known = entries.get(id);
        if (known !== undefined) { out[id] = known; continue; }
        out[id] = "loading the cycle from the library…";
        if (loading.has(id)) continue;
        loading.add(id);
        void fetchEntry(workspaceId, id).then((entry) => { entries.set(id, entry); loading.delete(id); onLoaded(); });
      }
      return out;
    },
  };
}
