import "server-only";
// Usage of library items, computed from the documents' current content: a document uses an
// item when one of its blocks names the item's id in an active library field (a drive cycle
// whose source is the library, an engine's full-load curve, a battery's OCV curve; see
// references.ts). Nothing is stored, so usage cannot go stale when a block changes (see db/schema-library.ts).
import * as Y from "yjs";
import { loadWorkspaceDocumentStates } from "@/db/library-usage";
import { readDoc } from "@/lib/notebook";
import { libraryReferences } from "./references";

export type DocumentRef = { id: string; title: string; archived: boolean };

/** item id → documents that refer to it (archived ones included: they can be restored). */
export async function documentsUsingLibrary(args: { workspaceId: string }): Promise<Map<string, DocumentRef[]>> {
  const out = new Map<string, DocumentRef[]>();
  for (const d of await loadWorkspaceDocumentStates(args)) {
    if (!d.state) continue;
    const doc = new Y.Doc();
    try {
      Y.applyUpdate(doc, d.state);
      for (const id of libraryReferences(readDoc(doc).blocks)) {
        const list = out.get(id) ?? [];
        list.push({ id: d.id, title: d.name, archived: d.archived });
        out.set(id, list);
      }
    } finally {
      doc.destroy();
    }
  }
  return out;
}
