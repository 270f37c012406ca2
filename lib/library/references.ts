// Which library items a document refers to: every active library-reference field of its blocks
// (a drive cycle whose source is the library, an engine's full-load curve, a battery's OCV
// curve). Pure; the server uses it for usage and before compiling, the client to know what to fetch.
import { fieldActive, FIELDS, type BlockSnapshot } from "@/lib/notebook";

export function libraryReferences(blocks: readonly BlockSnapshot[]): string[] {
  const ids = new Set<string>();
  for (const b of blocks) {
    for (const f of FIELDS[b.kind] ?? []) {
      if (f.type !== "text" || !f.library || !fieldActive(f, b.params, b.kind)) continue;
      const id = (b.params[f.key] ?? "").trim();
      if (id !== "") ids.add(id);
    }
  }
  return [...ids];
}
