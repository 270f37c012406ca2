import type { Metadata } from "next";
import { listWorkspacesForUser } from "@/db/memberships";
import { requireUser } from "@/lib/auth/server";
import { listApiTokensForUser } from "@/db/api-tokens";
import { UserPage } from "@/components/shell/user-page";
import { PageTitle } from "@/components/ui/page-title";
import { Panel } from "@/components/ui/panel";
import { TokensView, type TokenRow } from "./tokens-view";

export const metadata: Metadata = { title: "API tokens" };

export default async function TokensPage() {
  const { user } = await requireUser("/account/tokens");
  const [workspaces, tokens] = await Promise.all([listWorkspacesForUser({ userId: user.id }), listApiTokensForUser({ userId: user.id })]);
  const initial = JSON.parse(JSON.stringify(tokens)) as TokenRow[];
  return (
    <UserPage>
      <PageTitle title="API tokens">
        <p>
          Personal tokens for scripts: <code className="font-mono">Authorization: Bearer jb_…</code> on <code className="font-mono">POST /api/evaluate</code> (and its long-run <code className="font-mono">/jobs</code>) and
          on read requests under <code className="font-mono">/api/workspaces/&lt;id&gt;/</code> (documents, exports, library). A token reaches one workspace, with a
          role no higher than yours there; it is shown once and stored only as a hash.
        </p>
      </PageTitle>
      <Panel title="Your tokens">
        <TokensView workspaces={workspaces} initial={initial} />
      </Panel>
    </UserPage>
  );
}
