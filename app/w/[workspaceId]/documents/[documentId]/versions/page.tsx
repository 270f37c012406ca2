import type { Metadata } from "next";
import { can } from "@/lib/authz/policy";
import { readVersions } from "@/lib/versions/server/versions";
import { DocNav } from "@/components/versions/doc-nav";
import { loadDocumentPage } from "@/components/versions/page-data";
import { SaveVersionForm } from "@/components/versions/save-version-form";
import { VersionList } from "@/components/versions/version-list";
import { Panel } from "@/components/ui/panel";

export const metadata: Metadata = { title: "Versions" };

export default async function VersionsPage({ params }: { params: Promise<{ workspaceId: string; documentId: string }> }) {
  const { workspaceId, documentId } = await params;
  const { user, role, document } = await loadDocumentPage(workspaceId, documentId);
  const versions = await readVersions({ userId: user.id, workspaceId, documentId });
  const editable = document.archivedAt === null;
  return (
    <>
      <DocNav workspaceId={workspaceId} documentId={documentId} name={document.name} current="versions" />
      <div className="grid gap-gutter lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <Panel title="Versions" description="Named snapshots: the document, its compiled scenario and its figures, kept unchanged.">
          <VersionList versions={versions} workspaceId={workspaceId} documentId={documentId} canRestore={can(role, "document.edit") && can(role, "version.save") && editable} />
        </Panel>
        {can(role, "version.save") && editable ? (
          <Panel title="Save a version" description="Keeps the live document as it is now. The figures are computed on the server.">
            <SaveVersionForm workspaceId={workspaceId} documentId={documentId} />
          </Panel>
        ) : null}
      </div>
    </>
  );
}
