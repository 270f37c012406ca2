// Which library items a document refers to: drive-cycle blocks whose source is the library.
// Pure; the server uses it for usage and before compiling, the client to know what to fetch.
import type { BlockSnapshot } from "@/lib/notebook";

export function libraryReferences(blocks: readonly BlockSnapshot[]): string[] {
  const ids = new Set<string>();
  for (const b of blocks) {
    if (b.kind !== "drive_cycle" || (b.params.source ?? "").trim() !== "library") continue;
    const id = (b.params.library_id ?? "").trim();
    if (id !== "") ids.add(id);
  }
  return [...ids];
}
