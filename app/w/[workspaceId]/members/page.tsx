import type { Metadata } from "next";
import { can } from "@/lib/authz/policy";
import { readMembers } from "@/lib/workspaces/members";
import { loadWorkspace } from "@/components/workspace/load-workspace";
import { MembersView } from "@/components/members/members-view";
import { PageTitle } from "@/components/ui/page-title";

export const metadata: Metadata = { title: "Members" };

export default async function MembersPage({ params }: { params: Promise<{ workspaceId: string }> }) {
  const { workspaceId } = await params;
  const { user, workspace } = await loadWorkspace(workspaceId, "members.read");
  const canManage = can(workspace.role, "members.manage");
  // Rendered with the list in place; the client query takes over from this snapshot.
  const initial = await readMembers({ userId: user.id, workspaceId });
  const initialData = {
    members: initial.members,
    invitations: initial.invitations.map((i) => ({ ...i, expiresAt: i.expiresAt.toISOString() })),
  };
  return (
    <>
      <PageTitle eyebrow={workspace.name} title="Members">
        <p>Who can open this workspace, and what each person may do.</p>
      </PageTitle>
      <MembersView
        workspaceId={workspaceId}
        workspaceName={workspace.name}
        currentUserId={user.id}
        canManage={canManage}
        initialData={initialData}
        readOnlyReason={`You are a ${workspace.role} here, so this list is read-only: only owners invite people, change roles and remove members.`}
      />
    </>
  );
}
