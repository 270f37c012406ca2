// Review rounds of a document, newest first: who was asked, their verdicts and comments, and a
// verdict form for the signed-in user when they are one of the reviewers.
import Link from "next/link";
import type { RoundJson } from "@/components/versions/api";
import { sinceText } from "@/components/documents/when";
import { Markup } from "@/components/comments/markup";
import { ReviewStateBadge } from "./review-state-badge";
import { VerdictForm } from "./verdict-form";

export function RoundsList({ rounds, workspaceId, documentId, userId }: { rounds: RoundJson[]; workspaceId: string; documentId: string; userId: string }) {
  if (rounds.length === 0) return <p className="text-sm text-muted">No review has been requested yet.</p>;
  const base = `/w/${workspaceId}/documents/${documentId}`;
  return (
    <ol className="flex flex-col gap-4">
      {rounds.map((r) => {
        const mine = r.reviewers.find((x) => x.id === userId);
        const compare = r.previousVersionId ? `${base}/diff?from=${r.previousVersionId}&to=${r.version.id}&round=${r.id}` : `${base}/versions/${r.version.id}`;
        return (
          <li key={r.id} id={`round-${r.id}`} data-round={r.id} className="rounded-card border border-rule bg-paper-raised p-4">
            <header className="flex flex-wrap items-center gap-2">
              <h3 className="font-semibold">Review of v{r.version.number} · {r.version.name}</h3>
              <ReviewStateBadge state={r.state} />
              <span className="text-xs text-muted">asked by {r.requestedBy?.name ?? "a former member"} · <time dateTime={r.createdAt}>{sinceText(r.createdAt)}</time></span>
              <Link href={compare} className="ml-auto text-sm underline">{r.previousVersionId ? "See what changed" : "Open the version"}</Link>
            </header>
            {r.message ? <p className="mt-2 text-sm"><Markup body={r.message} /></p> : null}
            <ul className="mt-3 flex flex-col gap-2">
              {r.reviewers.map((x) => (
                <li key={x.id} className="text-sm" data-reviewer={x.id}>
                  <span className="font-medium">{x.name}</span>{" "}
                  {x.verdict === null ? <span className="text-muted">has not answered yet</span>
                    : x.verdict === "approve" ? <span className="text-ok">approved</span> : <span className="text-danger">requested changes</span>}
                  {x.comment ? <span className="block text-ink-soft"><Markup body={x.comment} /></span> : null}
                </li>
              ))}
            </ul>
            {mine ? (
              <div className="mt-4 border-t border-rule pt-3">
                <VerdictForm workspaceId={workspaceId} documentId={documentId} roundId={r.id} current={mine.verdict} />
              </div>
            ) : null}
          </li>
        );
      })}
    </ol>
  );
}
