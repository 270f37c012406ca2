// The server side of authorization: membership lookup + policy. Route handlers, pages and
// the collaboration server call authorizeWorkspace; nothing else decides permissions.
import { getMembership, type Membership } from "@/db/memberships";
import type { Tx } from "@/db/pool";
import { Forbidden, NotFound, Unauthorized } from "@/lib/http/errors";
import { currentTokenScope } from "@/lib/tokens/scope";
import { lowerRole } from "@/lib/tokens/roles";
import { can, type Action } from "./policy";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
export function isUuid(value: string): boolean {
  return UUID.test(value);
}

/**
 * Returns the caller's membership when their role allows `action` in the workspace.
 * Signed out → Unauthorized (401); not a member, or no such workspace → NotFound (404, so that
 * workspace ids do not leak); member without the right → Forbidden (403).
 * Pass `tx` to decide inside a transaction (after taking its locks), so that a role changed
 * concurrently cannot be used once more.
 */
export async function authorizeWorkspace(args: {
  userId: string | null | undefined;
  workspaceId: string;
  action: Action;
  tx?: Tx;
}): Promise<Membership> {
  if (!args.userId) throw new Unauthorized();
  if (!isUuid(args.workspaceId)) throw new NotFound("workspace not found");
  const found = await getMembership({ workspaceId: args.workspaceId, userId: args.userId, tx: args.tx });
  if (!found) throw new NotFound("workspace not found");
  // An API token reaches only its own workspace, with the lower of its role and its creator's.
  const scope = currentTokenScope();
  if (scope && scope.workspaceId !== args.workspaceId) throw new NotFound("workspace not found");
  const membership = scope ? { ...found, role: lowerRole(found.role, scope.role) } : found;
  if (!can(membership.role, args.action)) throw new Forbidden(forbiddenMessage(args.action));
  return membership;
}

function forbiddenMessage(action: Action): string {
  if (action === "members.manage" || action === "workspace.manage") return "only owners of this workspace can do this";
  return `your role in this workspace does not allow ${action.replace(".", " ")}`;
}
