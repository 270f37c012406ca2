import type { ReactNode } from "react";
import { AppHeader } from "@/components/shell/app-header";
import { loadWorkspace } from "@/components/workspace/load-workspace";

export default async function WorkspaceLayout({ children, params }: { children: ReactNode; params: Promise<{ workspaceId: string }> }) {
  const { workspaceId } = await params;
  const { user, workspaces } = await loadWorkspace(workspaceId);
  return (
    <>
      <AppHeader user={user} workspaces={workspaces} currentWorkspaceId={workspaceId} />
      <main className="mx-auto max-w-page px-gutter py-section">{children}</main>
    </>
  );
}
