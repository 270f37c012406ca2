"use client";
// The documents page body: search, sort, headline-figure column, archived toggle, and the create,
// rename, duplicate and archive (with undo) actions for the roles that may use them.
import { keepPreviousData, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useEffect, useMemo, useState } from "react";
import { ApiError } from "@/lib/client/api";
import {
  createDocument, documentKeys, duplicateDocument, listDocuments, renameDocument, setArchived,
  type DocumentRow, type DocumentSort, type ListQuery, type SummaryKpiKey,
} from "@/lib/client/notebook/documents-api";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { Panel } from "@/components/ui/panel";
import { CreateDocumentDialog, RenameDocumentDialog } from "./document-dialogs";
import { DocumentsTable, TableActionsContext, type TableActions } from "./documents-table";
import { KPI_CHOICES } from "./kpi";

interface Props {
  workspaceId: string;
  canCreate: boolean;
  canRename: boolean;
  canArchive: boolean;
  readOnlyReason?: string;
}

const message = (e: unknown) => (e instanceof ApiError ? e.message : "Something went wrong. Try again.");

export function DocumentsView({ workspaceId, canCreate, canRename, canArchive, readOnlyReason }: Props) {
  const router = useRouter();
  const client = useQueryClient();
  const [search, setSearch] = useState("");
  const [q, setQ] = useState("");
  const [sort, setSort] = useState<DocumentSort>("updated");
  const [dir, setDir] = useState<"asc" | "desc">("desc");
  const [kpi, setKpi] = useState<SummaryKpiKey>("fuel_l_per_100km");
  const [archived, setArchivedView] = useState(false);
  const [creating, setCreating] = useState(false);
  const [renaming, setRenaming] = useState<DocumentRow>();
  const [error, setError] = useState<string>();
  const [undo, setUndo] = useState<DocumentRow>();

  useEffect(() => { const t = setTimeout(() => setQ(search), 200); return () => clearTimeout(t); }, [search]);
  useEffect(() => { if (!undo) return; const t = setTimeout(() => setUndo(undefined), 10_000); return () => clearTimeout(t); }, [undo]);

  const query: ListQuery = { q, sort, dir, kpi, archived };
  const list = useQuery({ queryKey: documentKeys.list(workspaceId, query), queryFn: () => listDocuments(workspaceId, query), placeholderData: keepPreviousData });
  const refresh = () => client.invalidateQueries({ queryKey: documentKeys.all(workspaceId) });

  const create = useMutation({
    mutationFn: (input: { name: string; powertrain: DocumentRow["powertrain"] }) => createDocument(workspaceId, input),
    onSuccess: async (doc) => { setCreating(false); await refresh(); router.push(`/w/${workspaceId}/documents/${doc.id}`); },
  });
  const rename = useMutation({
    mutationFn: ({ row, name }: { row: DocumentRow; name: string }) => renameDocument(workspaceId, row.id, name),
    onSuccess: async () => { setRenaming(undefined); await refresh(); },
  });
  const duplicate = useMutation({
    mutationFn: (row: DocumentRow) => duplicateDocument(workspaceId, row.id),
    onSuccess: refresh, onError: (e) => setError(message(e)),
  });
  const archive = useMutation({
    mutationFn: ({ row, to }: { row: DocumentRow; to: boolean }) => setArchived(workspaceId, row.id, to),
    onSuccess: async (_d, { row, to }) => { setUndo(to ? row : undefined); await refresh(); },
    onError: (e) => setError(message(e)),
  });

  const busyId = duplicate.isPending ? duplicate.variables?.id : archive.isPending ? archive.variables?.row.id : undefined;
  const actions = useMemo<TableActions>(() => ({
    workspaceId, kpi, canRename, canDuplicate: canCreate, canArchive, busyId,
    rename: (row) => { setError(undefined); rename.reset(); setRenaming(row); },
    duplicate: (row) => { setError(undefined); duplicate.mutate(row); },
    archive: (row) => { setError(undefined); archive.mutate({ row, to: true }); },
    unarchive: (row) => { setError(undefined); archive.mutate({ row, to: false }); },
  }), [workspaceId, kpi, canRename, canCreate, canArchive, busyId, rename, duplicate, archive]);

  const onSort = (s: DocumentSort) => {
    if (s === sort) setDir(dir === "asc" ? "desc" : "asc");
    else { setSort(s); setDir(s === "updated" ? "desc" : "asc"); }
  };
  const rows = list.data ?? [];

  return (
    <TableActionsContext.Provider value={actions}>
      <Panel
        title={archived ? "Archived documents" : "Documents"}
        description={readOnlyReason}
        actions={canCreate ? <Button onClick={() => { create.reset(); setCreating(true); }}>New document</Button> : undefined}
      >
        <div className="mb-4 flex flex-wrap items-end gap-3">
          <label className="flex min-w-56 flex-1 flex-col gap-1 text-sm font-medium">
            Search
            <input type="search" value={search} onChange={(e) => setSearch(e.target.value)} placeholder="Document name"
              className="rounded-control border border-rule-strong bg-paper-raised px-3 py-2 font-normal" />
          </label>
          <label className="flex flex-col gap-1 text-sm font-medium">
            Headline figure
            <select value={kpi} onChange={(e) => setKpi(e.target.value as SummaryKpiKey)} className="rounded-control border border-rule-strong bg-paper-raised px-3 py-2 font-normal">
              {KPI_CHOICES.map((c) => <option key={c.key} value={c.key}>{c.label} ({c.unit})</option>)}
            </select>
          </label>
          <label className="flex items-center gap-2 pb-2 text-sm">
            <input type="checkbox" checked={archived} onChange={(e) => setArchivedView(e.target.checked)} className="size-4 accent-ink" />
            Show archived
          </label>
        </div>
        <FormMessage error={error ?? (list.error ? message(list.error) : undefined)} />
        {undo ? (
          <p role="status" className="mb-3 flex items-center gap-3 rounded-control bg-paper-sunk px-3 py-2 text-sm">
            Archived “{undo.name}”.
            <button type="button" className="font-medium text-electric underline underline-offset-2"
              onClick={() => { archive.mutate({ row: undo, to: false }); setUndo(undefined); }}>Undo</button>
          </p>
        ) : null}
        {list.isPending ? <p className="py-6 text-center text-sm text-muted">Loading documents…</p>
          : rows.length === 0 ? <Empty searching={q !== ""} archived={archived} canCreate={canCreate} />
          : <DocumentsTable rows={rows} sort={sort} dir={dir} onSort={onSort} />}
      </Panel>
      <CreateDocumentDialog open={creating} pending={create.isPending}
        error={create.error && !(create.error instanceof ApiError && create.error.status === 422) ? message(create.error) : undefined}
        fieldErrors={create.error instanceof ApiError ? create.error.fields : undefined}
        onCancel={() => setCreating(false)} onCreate={(input) => create.mutate(input)} />
      <RenameDocumentDialog open={renaming !== undefined} current={renaming?.name ?? ""} pending={rename.isPending}
        error={rename.error ? message(rename.error) : undefined}
        onCancel={() => setRenaming(undefined)} onRename={(name) => renaming && rename.mutate({ row: renaming, name })} />
    </TableActionsContext.Provider>
  );
}

function Empty({ searching, archived, canCreate }: { searching: boolean; archived: boolean; canCreate: boolean }) {
  return (
    <div className="rounded-control border border-dashed border-rule-strong px-gutter py-section text-center">
      <p className="font-medium">{searching ? "No document matches that search." : archived ? "No archived documents." : "No documents in this workspace yet."}</p>
      {!searching && !archived ? <p className="mt-1 text-sm text-muted">{canCreate ? "Start one from a powertrain template with New document." : "Editors create them; they will be listed here."}</p> : null}
    </div>
  );
}
