import "server-only";
import { notFound } from "next/navigation";
import { cache } from "react";
import { listWorkspacesForUser } from "@/db/memberships";
import { authorizeWorkspace } from "@/lib/authz";
import { requireUser } from "@/lib/auth/server";
import { NotFound } from "@/lib/http/errors";
import type { Action } from "@/lib/authz/policy";

// For workspace pages: the signed-in user (or a redirect to sign-in), their membership checked
// through lib/authz (notFound() for non-members and unknown ids), and the switcher's list.
// cache(): the layout and the page ask for the same thing in one request.
export const loadWorkspace = cache(async (workspaceId: string, action: Action = "workspace.read") => {
  const session = await requireUser();
  try {
    await authorizeWorkspace({ userId: session.user.id, workspaceId, action });
  } catch (error) {
    if (error instanceof NotFound) notFound();
    throw error;
  }
  const workspaces = await listWorkspacesForUser({ userId: session.user.id });
  const workspace = workspaces.find((w) => w.id === workspaceId);
  if (!workspace) notFound();
  return { user: session.user, workspace, workspaces };
});
