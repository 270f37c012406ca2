// Workspace creation, members, role changes, removal, leaving — with the last-owner rule.
import { getDb, type Tx } from "@/db/pool";
import { deleteMembership, getMembership, listMembers, lockOwners, setMembershipRole, type Member } from "@/db/memberships";
import { createWorkspaceWithOwner, getWorkspace, type Workspace } from "@/db/workspaces";
import { authorizeWorkspace, can, canGrantRole, isUuid, type Role } from "@/lib/authz";
import { Conflict, Forbidden, NotFound } from "@/lib/http/errors";
import { listPendingInvitations, type PendingInvitation } from "@/db/invitations";

export async function createWorkspace(args: { userId: string; name: string }): Promise<Workspace> {
  return createWorkspaceWithOwner({ name: args.name, ownerId: args.userId });
}

export async function readWorkspace(args: { userId: string; workspaceId: string }): Promise<{ workspace: Workspace; role: Role }> {
  const m = await authorizeWorkspace({ userId: args.userId, workspaceId: args.workspaceId, action: "workspace.read" });
  const workspace = await getWorkspace({ id: args.workspaceId });
  if (!workspace) throw new NotFound("workspace not found");
  return { workspace, role: m.role };
}

/** Members for every member; pending invitations only for those who manage members. */
export async function readMembers(args: { userId: string; workspaceId: string }): Promise<{ members: Member[]; invitations: PendingInvitation[] }> {
  const m = await authorizeWorkspace({ userId: args.userId, workspaceId: args.workspaceId, action: "members.read" });
  const [members, invitations] = await Promise.all([
    listMembers({ workspaceId: args.workspaceId }),
    can(m.role, "members.manage") ? listPendingInvitations({ workspaceId: args.workspaceId }) : Promise.resolve([]),
  ]);
  return { members, invitations };
}

export async function changeMemberRole(args: { actorId: string; workspaceId: string; userId: string; role: Role }): Promise<Member> {
  const check = async (tx?: Tx) => {
    const actor = await authorizeWorkspace({ userId: args.actorId, workspaceId: args.workspaceId, action: "members.manage", tx });
    if (!canGrantRole(actor.role, args.role)) throw new Forbidden("only owners can grant the owner role");
  };
  await check();
  if (!isUuid(args.userId)) throw new NotFound("member not found");
  await getDb().transaction(async (tx) => {
    const owners = await lockOwners({ workspaceId: args.workspaceId, tx });
    await check(tx); // again under the lock: the actor's own role may have just changed
    const target = await getMembership({ workspaceId: args.workspaceId, userId: args.userId, tx });
    if (!target) throw new NotFound("member not found");
    if (target.role === "owner" && args.role !== "owner" && owners.length <= 1) throw new Conflict("the last owner cannot be demoted");
    await setMembershipRole({ workspaceId: args.workspaceId, userId: args.userId, role: args.role, tx });
  });
  const member = (await listMembers({ workspaceId: args.workspaceId })).find((x) => x.userId === args.userId);
  if (!member) throw new NotFound("member not found");
  return member;
}

/** An owner removes anyone; any member may remove themselves (leave). The last owner stays. */
export async function removeMember(args: { actorId: string; workspaceId: string; userId: string }): Promise<void> {
  const leaving = args.actorId === args.userId;
  const action = leaving ? "workspace.read" : "members.manage";
  await authorizeWorkspace({ userId: args.actorId, workspaceId: args.workspaceId, action });
  if (!isUuid(args.userId)) throw new NotFound("member not found");
  await getDb().transaction(async (tx) => {
    const owners = await lockOwners({ workspaceId: args.workspaceId, tx });
    await authorizeWorkspace({ userId: args.actorId, workspaceId: args.workspaceId, action, tx }); // again under the lock
    const target = await getMembership({ workspaceId: args.workspaceId, userId: args.userId, tx });
    if (!target) throw new NotFound("member not found");
    if (target.role === "owner" && owners.length <= 1)
      throw new Conflict(
        leaving
          ? "the last owner cannot leave the workspace; make another member owner first"
          : "the last owner cannot be removed",
      );
    await deleteMembership({ workspaceId: args.workspaceId, userId: args.userId, tx });
  });
}
