import type { Metadata } from "next";
import { can } from "@/lib/authz/policy";
import { listLibrary } from "@/lib/library/service";
import { loadWorkspace } from "@/components/workspace/load-workspace";
import { LibraryTable } from "@/components/library/library-table";
import { UploadPanel } from "@/components/library/upload-panel";
import { PageTitle } from "@/components/ui/page-title";
import { Panel } from "@/components/ui/panel";
import type { LibraryRow } from "@/components/library/api";

export const metadata: Metadata = { title: "Library" };

export default async function LibraryPage({ params }: { params: Promise<{ workspaceId: string }> }) {
  const { workspaceId } = await params;
  const { user, workspace } = await loadWorkspace(workspaceId, "library.read");
  const items = await listLibrary({ userId: user.id, workspaceId });
  const initial = JSON.parse(JSON.stringify(items)) as LibraryRow[];
  return (
    <>
      <PageTitle eyebrow={workspace.name} title="Library">
        <p>
          Drive cycles and component tables the team shares. A drive-cycle block uses a saved cycle when its source is
          &ldquo;From the library&rdquo; and it names the cycle&rsquo;s id.
        </p>
      </PageTitle>
      <div className="grid gap-gutter">
        {can(workspace.role, "library.write") ? (
          <Panel title="Upload" description="Columns and units are guessed from the header; check them before saving. Nothing is stored until you save.">
            <UploadPanel workspaceId={workspaceId} />
          </Panel>
        ) : null}
        <Panel title="Saved items">
          <LibraryTable workspaceId={workspaceId} canDelete={can(workspace.role, "library.delete")} initial={initial} />
        </Panel>
      </div>
    </>
  );
}
