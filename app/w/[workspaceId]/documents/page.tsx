import type { Metadata } from "next";
import { can } from "@/lib/authz/policy";
import { loadWorkspace } from "@/components/workspace/load-workspace";
import { DocumentsView } from "@/components/documents/documents-view";
import { PageTitle } from "@/components/ui/page-title";

export const metadata: Metadata = { title: "Documents" };

export default async function DocumentsPage({ params }: { params: Promise<{ workspaceId: string }> }) {
  const { workspaceId } = await params;
  const { workspace } = await loadWorkspace(workspaceId, "document.read");
  const role = workspace.role;
  const canCreate = can(role, "document.create");
  return (
    <>
      <PageTitle eyebrow={workspace.name} title="Scenario documents">
        <p>Each document is one architecture on one drive cycle, with its figures recalculated as you edit.</p>
      </PageTitle>
      <DocumentsView
        workspaceId={workspaceId}
        canCreate={canCreate}
        canRename={can(role, "document.edit")}
        canArchive={can(role, "document.delete")}
        readOnlyReason={canCreate ? undefined : `You are a ${role} here: you can open every document, but not create, rename or archive them.`}
      />
    </>
  );
}
