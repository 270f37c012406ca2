"use client";
// Blocks pick library items by name (the notebook's library pickers store the id). A component
// table's lists can also be copied into the block's own list fields (the notebook's list syntax:
// "800, 1500, 3000 rpm"), for a variant that edits the points; a cycle's id can be copied for the API.
import { useState } from "react";
import { api } from "@/lib/client/api";
import type { LibraryKind } from "@/lib/library/kinds";
import { blockValueLines as lines, type ComponentData as Data } from "@/lib/library/block-values";

export function BlockValues({ workspaceId, id, kind }: { workspaceId: string; id: string; kind: LibraryKind }) {
  const [rows, setRows] = useState<[string, string][] | null>(null);
  const [copied, setCopied] = useState<string | null>(null);
  if (kind === "cycle") {
    return (
      <button type="button" className="text-xs underline" onClick={() => void navigator.clipboard?.writeText(id).then(() => setCopied(id))}>
        {copied ? "id copied" : "copy id (for the API)"}
      </button>
    );
  }
  return (
    <details onToggle={(e) => {
      if ((e.target as HTMLDetailsElement).open && !rows)
        void api<{ item: { data: Data } }>(`/api/workspaces/${encodeURIComponent(workspaceId)}/library/${encodeURIComponent(id)}`).then((r) => setRows(lines(kind, r.item.data)));
    }}>
      <summary className="cursor-pointer text-xs underline">values to edit in a block</summary>
      {rows ? (
        <ul className="mt-1 space-y-1">
          {rows.map(([field, text]) => (
            <li key={field} className="text-xs">
              <span className="text-muted">{field}</span>{" "}
              <button type="button" className="underline" onClick={() => void navigator.clipboard?.writeText(text).then(() => setCopied(field))}>{copied === field ? "copied" : "copy"}</button>
              <code className="block break-all font-mono">{text}</code>
            </li>
          ))}
        </ul>
      ) : <p className="text-xs text-muted">loading…</p>}
    </details>
  );
}
