import type { Metadata } from "next";
import { can } from "@/lib/authz/policy";
import { HttpError } from "@/lib/http/errors";
import { diffRefs, readVersions } from "@/lib/versions/server/versions";
import { readThreads } from "@/lib/versions/server/threads";
import { readRounds } from "@/lib/versions/server/reviews";
import { AllThreads } from "@/components/comments/all-threads";
import { ThreadsProvider } from "@/components/comments/threads-context";
import { DocNav } from "@/components/versions/doc-nav";
import { ComparePicker } from "@/components/versions/diff/compare-picker";
import { BlockChanges } from "@/components/versions/diff/block-changes";
import { TraceOverlay, Waterfall } from "@/components/versions/diff/charts";
import { KpiTable } from "@/components/versions/diff/kpi-table";
import { LedgerDeltaTable } from "@/components/versions/diff/ledger-table";
import { loadDocumentPage, mentionables } from "@/components/versions/page-data";
import { ReviewStateBadge } from "@/components/reviews/review-state-badge";
import { VerdictForm } from "@/components/reviews/verdict-form";
import { Panel } from "@/components/ui/panel";
import { PageTitle } from "@/components/ui/page-title";

export const metadata: Metadata = { title: "Compare versions" };

type Params = { workspaceId: string; documentId: string };
type Search = { from?: string; to?: string; round?: string; all?: string };

export default async function DiffPage({ params, searchParams }: { params: Promise<Params>; searchParams: Promise<Search> }) {
  const { workspaceId, documentId } = await params;
  const q = await searchParams;
  const { user, role, document } = await loadDocumentPage(workspaceId, documentId);
  const args = { userId: user.id, workspaceId, documentId };
  const versions = await readVersions(args);
  const from = q.from ?? versions[0]?.id ?? "";
  const to = q.to ?? "live";
  let diff: Awaited<ReturnType<typeof diffRefs>> | null = null;
  let problem: string | null = null;
  if (!from) problem = "Save a version first; then you can compare it with later versions or the live document.";
  else {
    try {
      diff = await diffRefs({ ...args, from, to });
    } catch (e) {
      if (e instanceof HttpError && e.status === 404) problem = `${e.message}. Choose two versions above.`;
      else throw e;
    }
  }
  // New comments attach to the newer side when it is a saved version, else to the older one.
  const anchorVersion = to !== "live" ? to : from !== "live" ? from : null;
  const [threads, people, rounds] = await Promise.all([
    anchorVersion && diff ? readThreads({ ...args, versionId: anchorVersion }) : Promise.resolve([]),
    mentionables(workspaceId),
    readRounds(args),
  ]);
  const round = q.round ? rounds.find((r) => r.id === q.round) : undefined;
  const mine = round?.reviewers.find((r) => r.id === user.id);
  return (
    <ThreadsProvider workspaceId={workspaceId} documentId={documentId} versionId={anchorVersion} initial={threads}
      canWrite={can(role, "comment.write")} canResolve={can(role, "comment.resolve")} members={people.handles}>
      <DocNav workspaceId={workspaceId} documentId={documentId} name={document.name} current="diff" />
      <PageTitle title="Compare versions">
        <p>A is the older side, B the newer. This page&apos;s address can be shared.</p>
      </PageTitle>
      <ComparePicker versions={versions.map((v) => ({ id: v.id, label: `v${v.number} · ${v.name}` }))} from={from} to={to} round={q.round} />
      {round ? (
        <Panel className="mb-gutter" title={`Review of v${round.version.number} · ${round.version.name}`} actions={<ReviewStateBadge state={round.state} />}
          description={`Asked by ${round.requestedBy?.name ?? "a former member"}${round.message ? `: ${round.message}` : ""}`}>
          {mine ? <VerdictForm workspaceId={workspaceId} documentId={documentId} roundId={round.id} current={mine.verdict} /> : <p className="text-sm text-muted">Reviewers: {round.reviewers.map((r) => r.name).join(", ")}.</p>}
        </Panel>
      ) : null}
      {problem ? <p role="alert" className="rounded-control border border-warn/40 bg-warn-soft px-3 py-2 text-sm text-warn">{problem}</p> : null}
      {diff ? (
        <div className="flex flex-col gap-gutter" data-diff>
          <p className="text-sm" data-diff-counts>
            <strong>{diff.from}</strong> → <strong>{diff.to}</strong>: {diff.counts.changed} block{diff.counts.changed === 1 ? "" : "s"} changed, {diff.counts.added} added, {diff.counts.removed} removed, {diff.counts.moved} moved.
            {diff.meta.name ? ` Renamed from “${diff.meta.name.from}” to “${diff.meta.name.to}”.` : ""}
            {diff.meta.powertrain ? ` Powertrain ${diff.meta.powertrain.from ?? "none"} → ${diff.meta.powertrain.to ?? "none"}.` : ""}
          </p>
          <div className="grid gap-gutter lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
            <div className="flex flex-col gap-gutter">
              <Panel title="Parameter changes, block by block" actions={<a className="text-sm underline" href={`?from=${from}&to=${to}${q.round ? `&round=${q.round}` : ""}${q.all ? "" : "&all=1"}`}>{q.all ? "Only changes" : "Show every block"}</a>}>
                <BlockChanges blocks={diff.blocks} showUnchanged={q.all === "1"} />
              </Panel>
              {diff.ledger ? (
                <Panel title="Loss ledger, row by row" description="Where each joule went in A and in B. Comment on a row to challenge it.">
                  <LedgerDeltaTable rows={diff.ledger} />
                </Panel>
              ) : null}
            </div>
            <div className="flex flex-col gap-gutter">
              {diff.kpi ? <Panel title="Headline figures"><KpiTable rows={diff.kpi} /></Panel> : null}
              {diff.waterfall ? <Panel title="Energy used, A → B" description="Each bar is one ledger term's change."><Waterfall steps={diff.waterfall} /></Panel> : null}
              <Panel title="Comments" description={anchorVersion ? "Threads on the newer saved version." : "Compare with a saved version to comment."}><AllThreads /></Panel>
            </div>
          </div>
          {diff.traces && diff.traces.length > 0 ? <Panel title="Traces, overlaid"><TraceOverlay points={diff.traces} /></Panel> : null}
          {!diff.kpi ? <p className="text-sm text-muted">Neither side has figures (neither compiled), so only parameter changes are shown.</p> : null}
        </div>
      ) : null}
    </ThreadsProvider>
  );
}
