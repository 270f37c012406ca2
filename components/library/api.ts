// Client calls of the team library API. Uploads go as multipart so that the server sees the
// file's bytes (encoding check); everything else through the shared JSON helper.
import { api, ApiError } from "@/lib/client/api";
import type { LibraryKind } from "@/lib/library/kinds";
import type { UploadPreview } from "@/lib/library/preview";
import type { LibrarySummary } from "@/lib/library/summary";
import type { UploadIssue } from "@/lib/uploads/issues";

export type LibraryRow = {
  id: string;
  kind: LibraryKind;
  name: string;
  sourceNote: string;
  summary: LibrarySummary & { file_name?: string | null };
  uploadedBy: { id: string; name: string } | null;
  createdAt: string;
  usedBy: { id: string; title: string; archived: boolean }[];
};

export const libraryKey = (workspaceId: string) => ["workspace", workspaceId, "library"] as const;
const base = (w: string) => `/api/workspaces/${encodeURIComponent(w)}/library`;

export async function listLibrary(workspaceId: string): Promise<LibraryRow[]> {
  return (await api<{ items: LibraryRow[] }>(base(workspaceId))).items;
}

export async function deleteLibraryItem(workspaceId: string, id: string): Promise<void> {
  await api(`${base(workspaceId)}/${encodeURIComponent(id)}`, "DELETE");
}

async function postForm<T>(url: string, form: FormData): Promise<{ status: number; body: T }> {
  let res: Response;
  try {
    res = await fetch(url, { method: "POST", body: form, credentials: "same-origin", headers: { accept: "application/json" } });
  } catch {
    throw new ApiError(0, "The server could not be reached. Check your connection and try again.");
  }
  const body = (await res.json().catch(() => ({}))) as T & { error?: string; fields?: Record<string, string> };
  if (res.status >= 400 && res.status !== 422) throw new ApiError(res.status, body.error ?? `The server answered with an error (${res.status}).`, body.fields ?? {});
  return { status: res.status, body };
}

function form(kind: LibraryKind, file: File, confirmation: unknown, extra: Record<string, string> = {}): FormData {
  const f = new FormData();
  f.set("kind", kind);
  f.set("file", file);
  if (confirmation) f.set("confirmation", JSON.stringify(confirmation));
  for (const [k, v] of Object.entries(extra)) f.set(k, v);
  return f;
}

export async function previewUpload(workspaceId: string, kind: LibraryKind, file: File, confirmation: unknown): Promise<UploadPreview> {
  const { status, body } = await postForm<UploadPreview & { error?: string; fields?: Record<string, string> }>(`${base(workspaceId)}/preview`, form(kind, file, confirmation));
  if (status === 422) throw new ApiError(422, body.error ?? "Some fields are not valid.", body.fields ?? {});
  return body;
}

export type SaveOutcome = { ok: true; id: string } | { ok: false; issues: UploadIssue[]; error: string; fields?: Record<string, string> };

export async function saveUpload(workspaceId: string, kind: LibraryKind, file: File, confirmation: unknown, name: string, sourceNote: string): Promise<SaveOutcome> {
  const { status, body } = await postForm<{ item?: { id: string }; issues?: UploadIssue[]; error?: string; fields?: Record<string, string> }>(base(workspaceId), form(kind, file, confirmation, { name, source_note: sourceNote }));
  if (status === 201 && body.item) return { ok: true, id: body.item.id };
  return { ok: false, issues: body.issues ?? [], error: body.error ?? "Not saved.", fields: body.fields };
}
