import type { Metadata } from "next";
import { requireUser } from "@/lib/auth/server";
import { UserPage } from "@/components/shell/user-page";
import { Panel } from "@/components/ui/panel";
import { PageTitle } from "@/components/ui/page-title";
import { CreateWorkspaceForm } from "@/components/workspace/create-workspace-form";

export const metadata: Metadata = { title: "New workspace" };

export default async function NewWorkspacePage() {
  await requireUser();
  return (
    <UserPage>
      <PageTitle title="New workspace">
        <p>A workspace holds a team's scenarios, versions and reviews. You become its owner and can invite colleagues.</p>
      </PageTitle>
      <div className="max-w-xl">
        <Panel>
          <CreateWorkspaceForm />
        </Panel>
      </div>
    </UserPage>
  );
}
