// The versions of a document: number, name, author, time, message and headline figures, with
// links to open, compare and (for editors) restore.
import Link from "next/link";
import type { VersionJson } from "./api";
import { sinceText } from "@/components/documents/when";
import { headline } from "./figures";
import { RestoreButton } from "./restore-button";

export function VersionList({ versions, workspaceId, documentId, canRestore }: { versions: VersionJson[]; workspaceId: string; documentId: string; canRestore: boolean }) {
  if (versions.length === 0) return <p className="text-sm text-muted">No versions yet. Save one to keep the document as it is now.</p>;
  const base = `/w/${workspaceId}/documents/${documentId}`;
  return (
    <ol className="flex flex-col divide-y divide-rule" data-version-list>
      {versions.map((v, i) => {
        const previous = versions[i + 1];
        return (
          <li key={v.id} className="flex flex-col gap-1 py-3" data-version={v.number}>
            <div className="flex flex-wrap items-baseline gap-2">
              <Link href={`${base}/versions/${v.id}`} className="font-semibold underline decoration-rule-strong underline-offset-4">v{v.number} · {v.name}</Link>
              <span className="text-xs text-muted">{v.author?.name ?? "a former member"} · <time dateTime={v.createdAt} title={v.createdAt}>{sinceText(v.createdAt)}</time></span>
            </div>
            {v.message ? <p className="text-sm text-ink-soft">{v.message}</p> : null}
            <p className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
              {headline(v.kpi).map((f) => <span key={f.label}><span className="text-muted">{f.label}</span> <span className="font-mono">{f.value}</span></span>)}
              {v.kpi === null ? <span className="text-warn">no figures: {v.problems[0] ?? "the document did not compile"}</span> : null}
            </p>
            <div className="flex flex-wrap items-center gap-3 text-sm">
              {previous ? <Link className="underline" href={`${base}/diff?from=${previous.id}&to=${v.id}`}>Compare with v{previous.number}</Link> : null}
              <Link className="underline" href={`${base}/diff?from=${v.id}&to=live`}>Compare with the live document</Link>
              {canRestore ? <RestoreButton workspaceId={workspaceId} documentId={documentId} versionId={v.id} label={`v${v.number}`} /> : null}
            </div>
          </li>
        );
      })}
    </ol>
  );
}
