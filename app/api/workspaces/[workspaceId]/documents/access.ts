// Shared by the documents route handlers: the caller's right on a document and the JSON shape.
import type { DocumentListRow } from "@/db/documents";

export { assertNotArchived, authorizeDocument } from "@/lib/documents/access";

export type DocumentJson = {
  id: string;
  name: string;
  powertrain: DocumentListRow["powertrain"];
  createdAt: string;
  updatedAt: string;
  createdBy: { id: string; name: string } | null;
  archived: boolean;
  archivedAt: string | null;
  summary: DocumentListRow["summary"];
};

export function documentJson(row: DocumentListRow): DocumentJson {
  return {
    id: row.id,
    name: row.name,
    powertrain: row.powertrain,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    createdBy: row.createdBy && row.createdByName !== null ? { id: row.createdBy, name: row.createdByName } : null,
    archived: row.archivedAt !== null,
    archivedAt: row.archivedAt?.toISOString() ?? null,
    summary: row.summary,
  };
}
