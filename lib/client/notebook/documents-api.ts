// Client side of the documents API (app/api/workspaces/:w/documents). Shapes as the route
// handlers return them; the list query key is shared by the table and the notebook.
import { api } from "@/lib/client/api";
import type { PowertrainKind } from "@/lib/notebook";

export interface DocumentSummary {
  fuel_l_per_100km: number | null;
  co2_g_per_km: number | null;
  electric_kwh_per_100km: number | null;
  soc_initial: number | null;
  soc_final: number | null;
  feasible: boolean;
}

export interface DocumentRow {
  id: string;
  name: string;
  powertrain: PowertrainKind;
  updatedAt: string;
  createdAt?: string;
  archived?: boolean;
  summary: DocumentSummary | null;
}

export const documentKeys = {
  list: (workspaceId: string) => ["workspace", workspaceId, "documents"] as const,
  one: (workspaceId: string, documentId: string) => ["workspace", workspaceId, "documents", documentId] as const,
};

const base = (w: string) => `/api/workspaces/${encodeURIComponent(w)}/documents`;

export async function listDocuments(workspaceId: string): Promise<DocumentRow[]> {
  const res = await api<{ documents: DocumentRow[] }>(base(workspaceId));
  return res.documents;
}

export async function getDocument(workspaceId: string, documentId: string): Promise<{ document: DocumentRow; role: string }> {
  return api(`${base(workspaceId)}/${encodeURIComponent(documentId)}`);
}

export async function createDocument(workspaceId: string, body: { name: string; powertrain: PowertrainKind }): Promise<DocumentRow> {
  const res = await api<{ document: DocumentRow }>(base(workspaceId), "POST", body);
  return res.document;
}

export async function renameDocument(workspaceId: string, documentId: string, name: string): Promise<DocumentRow> {
  const res = await api<{ document: DocumentRow }>(`${base(workspaceId)}/${encodeURIComponent(documentId)}`, "PATCH", { name });
  return res.document;
}

export async function duplicateDocument(workspaceId: string, documentId: string): Promise<DocumentRow> {
  const res = await api<{ document: DocumentRow }>(`${base(workspaceId)}/${encodeURIComponent(documentId)}/duplicate`, "POST", {});
  return res.document;
}

export async function archiveDocument(workspaceId: string, documentId: string, archived: boolean): Promise<void> {
  await api(`${base(workspaceId)}/${encodeURIComponent(documentId)}/archive`, "POST", { archived });
}

export async function putSummary(workspaceId: string, documentId: string, summary: DocumentSummary): Promise<void> {
  await api(`${base(workspaceId)}/${encodeURIComponent(documentId)}/summary`, "PUT", summary);
}
