import type { ReactNode } from "react";
import { listWorkspacesForUser } from "@/db/memberships";
import { requireUser } from "@/lib/auth/server";
import { AppHeader } from "./app-header";

// Frame for signed-in pages that belong to no workspace (account, new workspace).
export async function UserPage({ children }: { children: ReactNode }) {
  const { user } = await requireUser();
  const workspaces = await listWorkspacesForUser({ userId: user.id });
  return (
    <>
      <AppHeader user={user} workspaces={workspaces} />
      <main className="mx-auto max-w-page px-gutter py-section">{children}</main>
    </>
  );
}
