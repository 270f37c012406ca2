import type { Metadata } from "next";
import Link from "next/link";
import { can } from "@/lib/authz/policy";
import { readVersion, readVersions } from "@/lib/versions/server/versions";
import { readThreads } from "@/lib/versions/server/threads";
import { AllThreads } from "@/components/comments/all-threads";
import { ThreadsProvider } from "@/components/comments/threads-context";
import { DocNav } from "@/components/versions/doc-nav";
import { headline } from "@/components/versions/figures";
import { loadDocumentPage, mentionables, orNotFound } from "@/components/versions/page-data";
import { RestoreButton } from "@/components/versions/restore-button";
import { VersionBlocks, VersionLedger } from "@/components/versions/version-view";
import { viewBlocks, viewLedger } from "@/components/versions/view-model";
import { Panel } from "@/components/ui/panel";
import { ExportMenu } from "@/components/library/export-menu";
import { PageTitle } from "@/components/ui/page-title";

export const metadata: Metadata = { title: "Version" };

type Params = { workspaceId: string; documentId: string; versionId: string };

export default async function VersionPage({ params }: { params: Promise<Params> }) {
  const { workspaceId, documentId, versionId } = await params;
  const { user, role, document } = await loadDocumentPage(workspaceId, documentId);
  const args = { userId: user.id, workspaceId, documentId };
  const version = await orNotFound(readVersion({ ...args, versionId }));
  const [threads, versions, people] = await Promise.all([readThreads({ ...args, versionId }), readVersions(args), mentionables(workspaceId)]);
  const previous = versions.find((v) => v.number < version.number);
  const base = `/w/${workspaceId}/documents/${documentId}`;
  return (
    <ThreadsProvider workspaceId={workspaceId} documentId={documentId} versionId={version.id} initial={threads}
      canWrite={can(role, "comment.write")} canResolve={can(role, "comment.resolve")} members={people.handles}>
      <DocNav workspaceId={workspaceId} documentId={documentId} name={document.name} current="versions" />
      <PageTitle eyebrow={`Version ${version.number} · read-only`} title={version.name}>
        <p>
          Saved by {version.author?.name ?? "a former member"} on <time dateTime={version.createdAt}>{version.createdAt.slice(0, 16).replace("T", " ")} UTC</time>.
          {version.message ? ` ${version.message}` : ""}
        </p>
      </PageTitle>
      <div className="mb-gutter flex flex-wrap items-center gap-4 text-sm">
        {previous ? <Link className="underline" href={`${base}/diff?from=${previous.id}&to=${version.id}`}>Compare with v{previous.number}</Link> : null}
        <Link className="underline" href={`${base}/diff?from=${version.id}&to=live`}>Compare with the live document</Link>
        {version.summary ? <ExportMenu workspaceId={workspaceId} documentId={documentId} versionId={version.id} /> : null}
        {can(role, "document.edit") && document.archivedAt === null ? <RestoreButton workspaceId={workspaceId} documentId={documentId} versionId={version.id} label={`v${version.number}`} /> : null}
      </div>
      <div className="grid gap-gutter lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <div className="flex flex-col gap-gutter">
          <Panel title="Headline figures">
            {version.summary ? (
              <p className="flex flex-wrap gap-x-6 gap-y-1 text-sm">{headline(version.summary.kpi).map((f) => <span key={f.label}><span className="text-muted">{f.label}</span> <span className="font-mono">{f.value}</span></span>)}</p>
            ) : <p className="text-sm text-warn">No figures: {version.problems.join("; ") || "the document did not compile"}.</p>}
          </Panel>
          <Panel title="Blocks"><VersionBlocks blocks={viewBlocks(version.snapshot)} /></Panel>
        </div>
        <div className="flex flex-col gap-gutter">
          {version.summary ? <Panel title="Loss ledger"><VersionLedger rows={viewLedger(version.summary)} /></Panel> : null}
          <Panel title="Comments on this version"><AllThreads /></Panel>
        </div>
      </div>
    </ThreadsProvider>
  );
}
