// Client side of the documents API (app/api/workspaces/:w/documents): list with search and sort,
// create from a template, rename, duplicate, archive/unarchive, and the headline summary.
import { api } from "@/lib/client/api";
import type { PowertrainKind } from "@/lib/notebook";
import type { Result } from "@/lib/engine";

/** Numeric headline figures kept with a document (lib/schemas/documents.ts SUMMARY_KPI_KEYS). */
export const SUMMARY_KPI_KEYS = [
  "distance_km", "duration_s", "fuel_g", "fuel_l", "fuel_l_per_100km", "co2_g_per_km", "battery_net_kwh",
  "electric_kwh_per_100km", "soc_initial", "soc_final", "infeasible_steps", "engine_starts", "max_c_rate",
] as const;
export type SummaryKpiKey = (typeof SUMMARY_KPI_KEYS)[number];
export type SummaryKpi = Partial<Record<SummaryKpiKey, number | null>> & { feasible?: boolean };

export interface DocumentRow {
  id: string;
  name: string;
  powertrain: PowertrainKind;
  createdAt: string;
  updatedAt: string;
  createdBy: { id: string; name: string } | null;
  archived: boolean;
  archivedAt: string | null;
  summary: { kpi: SummaryKpi; computedAt?: string } | null;
  /** latest review round (lib/versions): its state and the version it reviews */
  review?: { state: "open" | "approved" | "changes_requested"; versionNumber: number } | null;
}

export type DocumentSort = "name" | "updated" | "powertrain" | "kpi";

export interface ListQuery {
  q: string;
  sort: DocumentSort;
  dir: "asc" | "desc";
  kpi: SummaryKpiKey;
  archived: boolean;
}

export const documentKeys = {
  all: (workspaceId: string) => ["workspace", workspaceId, "documents"] as const,
  list: (workspaceId: string, query: ListQuery) => ["workspace", workspaceId, "documents", "list", query] as const,
};

const base = (w: string) => `/api/workspaces/${encodeURIComponent(w)}/documents`;
const one = (w: string, d: string) => `${base(w)}/${encodeURIComponent(d)}`;

export async function listDocuments(workspaceId: string, query: ListQuery): Promise<DocumentRow[]> {
  const params = new URLSearchParams({ sort: query.sort, dir: query.dir, kpi: query.kpi, archived: query.archived ? "1" : "0" });
  if (query.q.trim()) params.set("q", query.q.trim());
  const res = await api<{ documents: DocumentRow[] }>(`${base(workspaceId)}?${params}`);
  return res.documents;
}

export async function createDocument(workspaceId: string, body: { name: string; powertrain: PowertrainKind }): Promise<DocumentRow> {
  return (await api<{ document: DocumentRow }>(base(workspaceId), "POST", body)).document;
}

export async function renameDocument(workspaceId: string, documentId: string, name: string): Promise<DocumentRow> {
  return (await api<{ document: DocumentRow }>(one(workspaceId, documentId), "PATCH", { name })).document;
}

export async function duplicateDocument(workspaceId: string, documentId: string): Promise<DocumentRow> {
  return (await api<{ document: DocumentRow }>(`${one(workspaceId, documentId)}/duplicate`, "POST", {})).document;
}

export async function setArchived(workspaceId: string, documentId: string, archived: boolean): Promise<DocumentRow> {
  return (await api<{ document: DocumentRow }>(`${one(workspaceId, documentId)}/${archived ? "archive" : "unarchive"}`, "POST", {})).document;
}

/** The summary the documents table shows: the Result's numeric KPIs (finite or null) and feasibility. */
export function summaryKpi(result: Result): SummaryKpi {
  const out: SummaryKpi = { feasible: result.kpi.feasible };
  for (const key of SUMMARY_KPI_KEYS) {
    const v = result.kpi[key];
    out[key] = typeof v === "number" && Number.isFinite(v) ? v : null;
  }
  return out;
}

export async function putSummary(workspaceId: string, documentId: string, kpi: SummaryKpi): Promise<void> {
  await api(`${one(workspaceId, documentId)}/summary`, "PUT", { kpi });
}
