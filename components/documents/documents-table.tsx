"use client";
// The documents of a workspace as a table (TanStack Table v9). Rows arrive sorted and filtered
// by the server; the header buttons change the sort it is asked for.
import Link from "next/link";
import { createColumnHelper, tableFeatures, useTable } from "@tanstack/react-table";
import { createContext, useContext } from "react";
import { POWERTRAIN_LABELS } from "@/lib/notebook";
import type { DocumentRow, DocumentSort, SummaryKpiKey } from "@/lib/client/notebook/documents-api";
import { KPI_CHOICES, kpiCell } from "./kpi";
import { sinceText } from "./when";
import { ReviewStateBadge } from "@/components/reviews/review-state-badge";

export interface TableActions {
  workspaceId: string;
  kpi: SummaryKpiKey;
  canRename: boolean;
  canDuplicate: boolean;
  canArchive: boolean;
  busyId?: string;
  rename: (row: DocumentRow) => void;
  duplicate: (row: DocumentRow) => void;
  archive: (row: DocumentRow) => void;
  unarchive: (row: DocumentRow) => void;
}

export const TableActionsContext = createContext<TableActions | null>(null);
const useActions = () => useContext(TableActionsContext)!;

const features = tableFeatures({});
const helper = createColumnHelper<typeof features, DocumentRow>();

function NameCell({ row }: { row: DocumentRow }) {
  const { workspaceId } = useActions();
  return (
    <span>
      <Link href={`/w/${workspaceId}/documents/${row.id}`} className="font-medium text-ink underline decoration-rule-strong underline-offset-4 hover:decoration-ink">{row.name}</Link>
      {row.archived ? <span className="ml-2 rounded-full bg-paper-sunk px-2 py-0.5 text-xs text-muted">archived</span> : null}
      {row.createdBy ? <span className="block text-xs text-muted">by {row.createdBy.name}</span> : null}
    </span>
  );
}

function KpiCell({ row }: { row: DocumentRow }) {
  const { kpi } = useActions();
  const feasible = row.summary?.kpi.feasible;
  return (
    <span className="num font-mono">
      {(() => { const text = kpiCell(row, kpi); return /^no /.test(text) ? <span className="font-sans text-xs text-muted">{text}</span> : text; })()}
      {feasible === false ? <span className="ml-2 rounded-full bg-danger-soft px-1.5 font-sans text-xs text-danger">infeasible</span> : null}
    </span>
  );
}

function ActionsCell({ row }: { row: DocumentRow }) {
  const a = useActions();
  const busy = a.busyId === row.id;
  const btn = "rounded-control px-2 py-1 text-sm font-medium hover:bg-paper-sunk disabled:opacity-50";
  return (
    <span className="inline-flex gap-1">
      {a.canRename && !row.archived ? <button type="button" className={btn} disabled={busy} onClick={() => a.rename(row)}>Rename<span className="sr-only"> {row.name}</span></button> : null}
      {a.canDuplicate ? <button type="button" className={btn} disabled={busy} onClick={() => a.duplicate(row)}>Duplicate<span className="sr-only"> {row.name}</span></button> : null}
      {a.canArchive ? (
        row.archived
          ? <button type="button" className={btn} disabled={busy} onClick={() => a.unarchive(row)}>Unarchive<span className="sr-only"> {row.name}</span></button>
          : <button type="button" className={`${btn} text-danger hover:bg-danger-soft`} disabled={busy} onClick={() => a.archive(row)}>Archive<span className="sr-only"> {row.name}</span></button>
      ) : null}
    </span>
  );
}

const columns = helper.columns([
  helper.accessor("name", { header: "Name", cell: (info) => <NameCell row={info.row.original} /> }),
  helper.accessor("powertrain", { header: "Powertrain", cell: (info) => <span className="text-ink-soft">{POWERTRAIN_LABELS[info.getValue()]}</span> }),
  helper.display({ id: "kpi", header: "Headline figure", cell: (info) => <KpiCell row={info.row.original} /> }),
  helper.display({ id: "review", header: "Review", cell: (info) => (info.row.original.review ? <ReviewStateBadge state={info.row.original.review.state} prefix={`v${info.row.original.review.versionNumber}`} /> : <span className="text-muted">—</span>) }),
  helper.accessor("updatedAt", { header: "Updated", cell: (info) => <time dateTime={info.getValue()} className="text-ink-soft">{sinceText(info.getValue())}</time> }),
  helper.display({ id: "actions", header: () => <span className="sr-only">Actions</span>, cell: (info) => <ActionsCell row={info.row.original} /> }),
]);

const SORT_OF_COLUMN: Record<string, DocumentSort> = { name: "name", powertrain: "powertrain", kpi: "kpi", updatedAt: "updated" };

export function DocumentsTable({ rows, sort, dir, onSort }: { rows: DocumentRow[]; sort: DocumentSort; dir: "asc" | "desc"; onSort: (s: DocumentSort) => void }) {
  const { kpi } = useActions();
  const table = useTable({ features, columns, data: rows, getRowId: (row) => row.id });
  const kpiLabel = KPI_CHOICES.find((c) => c.key === kpi)!;
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-left text-sm" data-documents>
        <caption className="sr-only">Scenario documents of this workspace</caption>
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id} className="border-b border-rule-strong">
              {group.headers.map((header) => {
                const s = SORT_OF_COLUMN[header.column.id];
                const active = s !== undefined && s === sort;
                return (
                  <th key={header.id} scope="col" aria-sort={active ? (dir === "asc" ? "ascending" : "descending") : undefined}
                    className={`px-cell py-3 text-xs font-semibold uppercase tracking-wide text-muted ${header.column.id === "actions" ? "text-right" : ""}`}>
                    {s ? (
                      <button type="button" onClick={() => onSort(s)} className="inline-flex items-center gap-1 uppercase tracking-wide hover:text-ink">
                        {header.column.id === "kpi" ? `${kpiLabel.label} (${kpiLabel.unit})` : <table.FlexRender header={header} />}
                        <span aria-hidden="true" className={active ? "text-ink" : "opacity-30"}>{active && dir === "desc" ? "↓" : "↑"}</span>
                      </button>
                    ) : <table.FlexRender header={header} />}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-rule last:border-b-0 hover:bg-paper-sunk/50" data-document-row={row.original.id}>
              {row.getAllCells().map((cell) => (
                <td key={cell.id} className={`px-cell py-3 align-top ${cell.column.id === "actions" ? "text-right" : ""}`}>
                  <table.FlexRender cell={cell} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
