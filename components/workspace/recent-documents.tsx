// The Documents panel of the workspace overview: how many there are, the few edited last, and the
// review rounds still waiting for verdicts. Server-rendered from rows the page loaded.
import Link from "next/link";
import type { PowertrainKind } from "@/lib/notebook/block-kinds";
import { POWERTRAIN_LABELS } from "@/lib/notebook/block-kinds";
import { documentPath, reviewsPath } from "@/lib/versions/server/links";
import { sinceText } from "@/components/documents/when";
import { headlineFigure } from "./headline-figure";

export interface RecentDocument {
  id: string;
  name: string;
  powertrain: PowertrainKind;
  updatedAt: Date;
  summary: { kpi: Partial<Record<string, number | boolean | null>> } | null;
}

export interface OpenRound { documentId: string; documentName: string; roundId: string; versionNumber: number }

export function RecentDocuments(props: { workspaceId: string; total: number; recent: RecentDocument[]; openRounds: OpenRound[] }) {
  const { workspaceId, total, recent, openRounds } = props;
  if (total === 0) {
    return (
      <div className="rounded-control border border-dashed border-rule-strong px-gutter py-section text-center">
        <p className="font-medium">No documents in this workspace yet.</p>
        <p className="mt-1 text-sm text-muted">
          <Link href={`/w/${workspaceId}/documents`} className="text-electric underline underline-offset-2">Open the documents list</Link> to create the first scenario.
        </p>
      </div>
    );
  }
  const now = Date.now();
  return (
    <div data-testid="overview-documents">
      <p className="text-sm">
        <span className="num text-2xl font-semibold" data-testid="document-count">{total}</span>{" "}
        {total === 1 ? "document" : "documents"} <span className="text-muted">(not archived)</span>
      </p>
      <h3 className="mt-4 text-sm font-semibold text-ink-soft">Recently updated</h3>
      <ul className="mt-2 divide-y divide-rule" aria-label="Recently updated documents">
        {recent.map((d) => (
          <li key={d.id} className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-0.5 py-2 text-sm">
            <span>
              <Link href={documentPath(workspaceId, d.id)} className="font-medium text-ink underline decoration-rule-strong underline-offset-4 hover:decoration-ink">{d.name}</Link>{" "}
              <span className="text-ink-soft">· {POWERTRAIN_LABELS[d.powertrain]}</span>
            </span>
            <span className="flex items-baseline gap-4">
              <span className="num">{headlineFigure(d.powertrain, d.summary)}</span>
              <time dateTime={d.updatedAt.toISOString()} className="w-20 text-right text-muted">{sinceText(d.updatedAt.toISOString(), now)}</time>
            </span>
          </li>
        ))}
      </ul>
      {openRounds.length > 0 ? (
        <>
          <h3 className="mt-4 text-sm font-semibold text-ink-soft">Open review rounds</h3>
          <ul className="mt-2 space-y-1 text-sm" aria-label="Open review rounds">
            {openRounds.map((r) => (
              <li key={r.roundId}>
                <Link href={reviewsPath(workspaceId, r.documentId, r.roundId)} className="text-electric underline underline-offset-2">{r.documentName}</Link>{" "}
                <span className="text-muted">version {r.versionNumber}, waiting for verdicts</span>
              </li>
            ))}
          </ul>
        </>
      ) : null}
      <p className="mt-4 text-sm">
        <Link href={`/w/${workspaceId}/documents`} className="font-medium text-electric underline underline-offset-2">All documents</Link>
      </p>
    </div>
  );
}
