import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getWorkspaceDocument } from "@/db/documents";
import { can } from "@/lib/authz/policy";
import { isUuid } from "@/lib/authz";
import { loadWorkspace } from "@/components/workspace/load-workspace";
import { NotebookClient } from "@/components/notebook/notebook-client";
import type { SummaryKpi } from "@/lib/client/notebook/documents-api";
import { DocumentReviewBar } from "@/components/reviews/document-review-bar";
import { ExportMenu } from "@/components/library/export-menu";

export const metadata: Metadata = { title: "Scenario" };

export default async function DocumentPage({ params }: { params: Promise<{ workspaceId: string; documentId: string }> }) {
  const { workspaceId, documentId } = await params;
  const { user, workspace } = await loadWorkspace(workspaceId, "document.read");
  const document = isUuid(documentId) ? await getWorkspaceDocument({ workspaceId, documentId }) : null;
  if (!document) notFound();
  const archived = document.archivedAt !== null;
  // Read per request: the same build runs against the demo's and the tests' collaboration ports.
  const collabUrl = process.env.COLLAB_URL ?? null;
  return (
    <>
    <DocumentReviewBar workspaceId={workspaceId} documentId={documentId} />
    <ExportMenu workspaceId={workspaceId} documentId={documentId} />
    <NotebookClient
      workspaceId={workspaceId}
      documentId={documentId}
      collabUrl={collabUrl}
      role={workspace.role}
      canEdit={can(workspace.role, "document.edit") && !archived}
      archived={archived}
      user={{ id: user.id, name: user.name }}
      name={document.name}
      powertrain={document.powertrain}
      summary={(document.summary?.kpi as SummaryKpi | undefined) ?? null}
    />
    </>
  );
}
