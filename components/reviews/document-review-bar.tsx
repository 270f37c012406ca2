import "server-only";
// Above the notebook: links to the document's versions, comparison and reviews, and the state
// of its latest review round.
import Link from "next/link";
import { latestRoundStates } from "@/db/reviews";
import { listVersions } from "@/db/versions";
import { ReviewStateBadge } from "./review-state-badge";

export async function DocumentReviewBar({ workspaceId, documentId }: { workspaceId: string; documentId: string }) {
  const [states, versions] = await Promise.all([latestRoundStates({ documentIds: [documentId] }), listVersions({ documentId })]);
  const latest = states.get(documentId);
  const base = `/w/${workspaceId}/documents/${documentId}`;
  const link = "rounded-control px-2 py-1 underline decoration-rule-strong underline-offset-4 hover:bg-paper-sunk";
  return (
    <nav aria-label="Versions and reviews" className="mb-3 flex flex-wrap items-center gap-2 text-sm" data-review-bar>
      <Link className={link} href={`${base}/versions`}>Versions ({versions.length})</Link>
      {versions[0] ? <Link className={link} href={`${base}/diff?from=${versions[0].id}&to=live`}>Changes since v{versions[0].number}</Link> : null}
      <Link className={link} href={`${base}/reviews`}>Reviews</Link>
      {latest ? <ReviewStateBadge state={latest.state} prefix={`v${latest.versionNumber}`} /> : null}
    </nav>
  );
}
