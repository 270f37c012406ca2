import type { Metadata } from "next";
import Link from "next/link";
import { listMembers } from "@/db/memberships";
import { can } from "@/lib/authz/policy";
import { loadWorkspace } from "@/components/workspace/load-workspace";
import { Panel } from "@/components/ui/panel";
import { PageTitle } from "@/components/ui/page-title";
import { RoleBadge } from "@/components/ui/role-badge";
import { roleSummary } from "@/components/workspace/role-summary";
import { loadOverviewDocuments } from "@/components/workspace/overview-data";
import { RecentDocuments } from "@/components/workspace/recent-documents";

export const metadata: Metadata = { title: "Workspace" };

export default async function WorkspaceHome({ params }: { params: Promise<{ workspaceId: string }> }) {
  const { workspaceId } = await params;
  const { workspace } = await loadWorkspace(workspaceId);
  const [members, docs] = await Promise.all([listMembers({ workspaceId }), loadOverviewDocuments(workspaceId)]);
  const counts = countByRole(members.map((m) => m.role));
  return (
    <>
      <PageTitle eyebrow="Workspace" title={workspace.name}>
        <p className="flex flex-wrap items-center gap-2">
          Your role: <RoleBadge role={workspace.role} /> <span className="text-muted">{roleSummary(workspace.role)}</span>
        </p>
      </PageTitle>
      <div className="grid gap-gutter md:grid-cols-[2fr_1fr]">
        <Panel title="Documents">
          <RecentDocuments workspaceId={workspaceId} {...docs} />
        </Panel>
        <Panel
          title="Members"
          actions={
            <Link href={`/w/${workspaceId}/members`} className="text-sm font-medium text-electric underline underline-offset-2">
              {can(workspace.role, "members.manage") ? "Manage" : "View all"}
            </Link>
          }
        >
          <p className="text-sm">
            <span className="num text-2xl font-semibold">{members.length}</span>{" "}
            {members.length === 1 ? "member" : "members"}
          </p>
          <dl className="mt-4 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5 text-sm">
            {(["owner", "editor", "reviewer", "viewer"] as const).map((role) => (
              <div key={role} className="contents">
                <dt className="text-muted">{role}s</dt>
                <dd className="num text-right">{counts[role] ?? 0}</dd>
              </div>
            ))}
          </dl>
        </Panel>
      </div>
    </>
  );
}

function countByRole(roles: string[]): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const role of roles) counts[role] = (counts[role] ?? 0) + 1;
  return counts;
}
