"use client";
// The workspace's library: what, from where, by whom, when, and which documents use it.
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { ApiError } from "@/lib/client/api";
import { LIBRARY_KIND_BLOCKS, LIBRARY_KIND_LABELS } from "@/lib/library/kinds";
import { deleteLibraryItem, libraryKey, listLibrary, type LibraryRow } from "./api";
import { summaryPairs } from "./summary-figures";
import { BlockValues } from "./block-values";

function Usage({ row, workspaceId }: { row: LibraryRow; workspaceId: string }) {
  if (row.usedBy.length === 0) return <span className="text-muted">not used</span>;
  return (
    <details>
      <summary className="cursor-pointer">used by {row.usedBy.length} document{row.usedBy.length === 1 ? "" : "s"}</summary>
      <ul className="mt-1 space-y-0.5">
        {row.usedBy.map((d) => (
          <li key={d.id}><Link className="underline" href={`/w/${workspaceId}/documents/${d.id}`}>{d.title}</Link>{d.archived ? " (archived)" : ""}</li>
        ))}
      </ul>
    </details>
  );
}

export function LibraryTable({ workspaceId, canDelete, initial }: { workspaceId: string; canDelete: boolean; initial: LibraryRow[] }) {
  const queryClient = useQueryClient();
  const { data = initial } = useQuery({ queryKey: libraryKey(workspaceId), queryFn: () => listLibrary(workspaceId), initialData: initial });
  const [error, setError] = useState<string | null>(null);
  const remove = useMutation({
    mutationFn: (id: string) => deleteLibraryItem(workspaceId, id),
    onSuccess: () => { setError(null); return queryClient.invalidateQueries({ queryKey: libraryKey(workspaceId) }); },
    onError: (e) => setError(e instanceof ApiError ? e.message : "Deleting failed."),
  });
  if (data.length === 0) return <p className="text-sm text-muted">The library is empty. Upload a drive cycle or a component table above.</p>;
  return (
    <div className="overflow-x-auto">
      {error ? <p role="alert" className="mb-2 text-sm text-danger">{error}</p> : null}
      <table className="w-full text-sm">
        <thead className="text-left text-muted">
          <tr><th className="py-2 pr-3">Name</th><th className="pr-3">Kind</th><th className="pr-3">Figures</th><th className="pr-3">Source</th><th className="pr-3">Uploaded</th><th className="pr-3">Usage</th><th /></tr>
        </thead>
        <tbody>
          {data.map((row) => (
            <tr key={row.id} className="border-t border-rule align-top">
              <td className="py-2 pr-3 font-medium">
                {row.name}
                <div className="font-mono text-xs text-muted" title={`library id, chosen in the notebook's ${LIBRARY_KIND_BLOCKS[row.kind]}`}>{row.id}</div>
                <BlockValues workspaceId={workspaceId} id={row.id} kind={row.kind} />
              </td>
              <td className="pr-3">{LIBRARY_KIND_LABELS[row.kind]}</td>
              <td className="pr-3">
                <span className="font-mono text-xs">{summaryPairs(row.summary).slice(0, 3).map(([k, v]) => `${k} ${v}`).join(" · ")}</span>
                {row.summary.kind === "cycle" ? <div className="text-xs text-ink-soft">{row.summary.recognition}</div> : null}
              </td>
              <td className="pr-3">{row.sourceNote || <span className="text-muted">—</span>}</td>
              <td className="pr-3">{row.uploadedBy?.name ?? "a former member"}<div className="text-xs text-muted">{new Date(row.createdAt).toLocaleString("en-GB")}</div></td>
              <td className="pr-3"><Usage row={row} workspaceId={workspaceId} /></td>
              <td>
                {canDelete ? (
                  <Button variant="danger" className="px-2 py-1 text-xs" disabled={remove.isPending || row.usedBy.length > 0}
                    title={row.usedBy.length > 0 ? `in use: change the documents' ${LIBRARY_KIND_BLOCKS[row.kind]} first` : undefined}
                    onClick={() => { if (window.confirm(`Delete "${row.name}" from the library?`)) remove.mutate(row.id); }}>Delete</Button>
                ) : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
