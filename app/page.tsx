import { redirect } from "next/navigation";
import { listWorkspacesForUser } from "@/db/memberships";
import { getCurrentSession } from "@/lib/auth/server";

// The front door: signed-out people sign in; signed-in people land in their first workspace.
export default async function Home() {
  const current = await getCurrentSession();
  if (!current) redirect("/sign-in");
  const workspaces = await listWorkspacesForUser({ userId: current.user.id });
  redirect(workspaces[0] ? `/w/${workspaces[0].id}` : "/workspaces/new");
}
