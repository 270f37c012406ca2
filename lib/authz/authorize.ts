// The server side of authorization: membership lookup + policy. Route handlers, pages and
// the collaboration server call authorizeWorkspace; nothing else decides permissions.
import { getMembership, type Membership } from "@/db/memberships";
import { Forbidden, NotFound, Unauthorized } from "@/lib/http/errors";
import { can, type Action } from "./policy";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
export function isUuid(value: string): boolean {
  return UUID.test(value);
}

/**
 * Returns the caller's membership when their role allows `action` in the workspace.
 * Signed out → Unauthorized (401); not a member, or no such workspace → NotFound (404, so that
 * workspace ids do not leak); member without the right → Forbidden (403).
 */
export async function authorizeWorkspace(args: {
  userId: string | null | undefined;
  workspaceId: string;
  action: Action;
}): Promise<Membership> {
  if (!args.userId) throw new Unauthorized();
  if (!isUuid(args.workspaceId)) throw new NotFound("workspace not found");
  const membership = await getMembership({ workspaceId: args.workspaceId, userId: args.userId });
  if (!membership) throw new NotFound("workspace not found");
  if (!can(membership.role, args.action)) throw new Forbidden(forbiddenMessage(args.action));
  return membership;
}

function forbiddenMessage(action: Action): string {
  if (action === "members.manage" || action === "workspace.manage") return "only owners of this workspace can do this";
  return `your role in this workspace does not allow ${action.replace(".", " ")}`;
}
