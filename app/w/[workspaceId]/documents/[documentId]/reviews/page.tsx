import type { Metadata } from "next";
import { can } from "@/lib/authz/policy";
import { readRounds } from "@/lib/versions/server/reviews";
import { readVersions } from "@/lib/versions/server/versions";
import { DocNav } from "@/components/versions/doc-nav";
import { loadDocumentPage, mentionables } from "@/components/versions/page-data";
import { RequestReviewForm } from "@/components/reviews/request-review-form";
import { RoundsList } from "@/components/reviews/rounds-list";
import { Panel } from "@/components/ui/panel";

export const metadata: Metadata = { title: "Reviews" };

export default async function ReviewsPage({ params }: { params: Promise<{ workspaceId: string; documentId: string }> }) {
  const { workspaceId, documentId } = await params;
  const { user, role, document } = await loadDocumentPage(workspaceId, documentId);
  const args = { userId: user.id, workspaceId, documentId };
  const [rounds, versions, people] = await Promise.all([readRounds(args), readVersions(args), mentionables(workspaceId)]);
  const candidates = people.members.filter((m) => m.userId !== user.id && can(m.role, "review.verdict")).map((m) => ({ id: m.userId, name: m.name, role: m.role }));
  return (
    <>
      <DocNav workspaceId={workspaceId} documentId={documentId} name={document.name} current="reviews" />
      <div className="grid gap-gutter lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <Panel title="Review rounds" description="Each round asks named reviewers to approve one version or request changes.">
          <RoundsList rounds={rounds} workspaceId={workspaceId} documentId={documentId} userId={user.id} />
        </Panel>
        {can(role, "review.request") ? (
          <Panel title="Request a review">
            <RequestReviewForm workspaceId={workspaceId} documentId={documentId} candidates={candidates}
              versions={versions.map((v) => ({ id: v.id, number: v.number, name: v.name }))} />
          </Panel>
        ) : null}
      </div>
    </>
  );
}
