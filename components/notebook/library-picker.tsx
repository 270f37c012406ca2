"use client";
// A library-reference field (drive cycle, full-load curve, OCV curve): a select of the
// workspace's items of the field's kind, plus "none". The block's Y.Text still holds the item's
// id, so co-editing, undo and compile work as for any other field; read-only members see the name.
import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { setParam, type BlockMap, type TextField } from "@/lib/notebook";
import { LIBRARY_KIND_LABELS, type LibraryKind } from "@/lib/library/kinds";
import { libraryKey, listLibrary, type LibraryRow } from "@/components/library/api";
import { useNotebook } from "./notebook-context";
import { useParamText, useTextValue } from "./use-param-text";

function kindPhrase(kind: LibraryKind): string {
  const label = LIBRARY_KIND_LABELS[kind].toLowerCase();
  return `${/^[aeiou]/.test(label) ? "an" : "a"} ${label}`;
}

/** What the select shows for an id that is not among the items of the right kind. */
function strayLabel(id: string, item: LibraryRow | undefined, pending: boolean, wanted: LibraryKind): string {
  if (item) return `${item.name} (${kindPhrase(item.kind)}, not ${kindPhrase(wanted)})`;
  return pending ? "loading the library…" : `not in the library: ${id}`;
}

export function LibraryPicker({ id, blockId, map, field, label, invalid, describedBy }: {
  id: string; blockId: string; map: BlockMap; field: TextField & { library: LibraryKind }; label: string; invalid: boolean; describedBy?: string;
}) {
  const { doc, canEdit, focusBlock, step, workspaceId } = useNotebook();
  const current = useTextValue(useParamText(map, field.key)).trim();
  const query = useQuery({ queryKey: libraryKey(workspaceId), queryFn: () => listLibrary(workspaceId), staleTime: 30_000 });
  const items = query.data ?? [];
  const options = items.filter((i) => i.kind === field.library);
  const item = items.find((i) => i.id === current);
  const listed = options.some((o) => o.id === current);

  if (!canEdit) {
    const shown = current === "" ? "none" : item && listed ? item.name : strayLabel(current, item, query.isPending, field.library);
    return <p id={id} aria-label={label} className="rounded-control border border-rule px-3 py-1.5 text-sm text-ink" data-library-id={current || undefined}>{shown}</p>;
  }
  return (
    <div>
      <select
        id={id}
        aria-label={label}
        value={current}
        aria-invalid={invalid || undefined}
        aria-describedby={describedBy}
        onFocus={() => focusBlock(blockId)}
        onChange={(event) => { const v = event.target.value; step(() => setParam(doc, blockId, field.key, v)); }}
        className={"w-full rounded-control border bg-paper-raised px-3 py-1.5 text-sm text-ink " + (invalid ? "border-danger" : "border-rule-strong")}
      >
        <option value="">none</option>
        {current !== "" && !listed ? <option value={current}>{strayLabel(current, item, query.isPending, field.library)}</option> : null}
        {options.map((o) => <option key={o.id} value={o.id}>{o.name}</option>)}
      </select>
      {query.isError ? <p role="alert" className="mt-0.5 text-xs text-danger">The library list could not be loaded; reload to try again.</p> : null}
      {query.isSuccess && options.length === 0 ? (
        <p className="mt-0.5 text-xs text-muted">
          No {LIBRARY_KIND_LABELS[field.library].toLowerCase()} in the <Link className="underline" href={`/w/${workspaceId}/library`}>library</Link> yet.
        </p>
      ) : null}
    </div>
  );
}
