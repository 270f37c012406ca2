import { and, asc, eq } from "drizzle-orm";
import type { Role } from "@/lib/schemas/fields";
import { getDb, type Tx } from "./pool";
import { memberships, users, workspaces } from "./schema";

export type Membership = { workspaceId: string; userId: string; role: Role };

export async function getMembership(args: { workspaceId: string; userId: string; tx?: Tx }): Promise<Membership | null> {
  const rows = await (args.tx ?? getDb())
    .select({ workspaceId: memberships.workspaceId, userId: memberships.userId, role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.workspaceId, args.workspaceId), eq(memberships.userId, args.userId)))
    .limit(1);
  return rows[0] ?? null;
}

export async function listWorkspacesForUser(args: { userId: string }): Promise<{ id: string; name: string; role: Role }[]> {
  return getDb()
    .select({ id: workspaces.id, name: workspaces.name, role: memberships.role })
    .from(memberships)
    .innerJoin(workspaces, eq(workspaces.id, memberships.workspaceId))
    .where(eq(memberships.userId, args.userId))
    .orderBy(asc(workspaces.name), asc(workspaces.id));
}

export type Member = { userId: string; email: string; name: string; role: Role };

export async function listMembers(args: { workspaceId: string }): Promise<Member[]> {
  return getDb()
    .select({ userId: users.id, email: users.email, name: users.name, role: memberships.role })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.workspaceId, args.workspaceId))
    .orderBy(asc(users.name), asc(users.email));
}

export async function addMembership(args: Membership & { tx?: Tx }): Promise<void> {
  await (args.tx ?? getDb())
    .insert(memberships)
    .values({ workspaceId: args.workspaceId, userId: args.userId, role: args.role });
}

export async function setMembershipRole(args: Membership & { tx?: Tx }): Promise<void> {
  await (args.tx ?? getDb())
    .update(memberships)
    .set({ role: args.role })
    .where(and(eq(memberships.workspaceId, args.workspaceId), eq(memberships.userId, args.userId)));
}

export async function deleteMembership(args: { workspaceId: string; userId: string; tx?: Tx }): Promise<void> {
  await (args.tx ?? getDb())
    .delete(memberships)
    .where(and(eq(memberships.workspaceId, args.workspaceId), eq(memberships.userId, args.userId)));
}

/**
 * Owner user ids of the workspace, read after locking the workspace row FOR UPDATE: every
 * membership change takes that one lock first, so concurrent changes run one after another
 * (no deadlock between row locks taken in different orders) and the last-owner check holds.
 */
export async function lockOwners(args: { workspaceId: string; tx: Tx }): Promise<string[]> {
  await args.tx.select({ id: workspaces.id }).from(workspaces).where(eq(workspaces.id, args.workspaceId)).for("update");
  const rows = await args.tx
    .select({ userId: memberships.userId })
    .from(memberships)
    .where(and(eq(memberships.workspaceId, args.workspaceId), eq(memberships.role, "owner")));
  return rows.map((r) => r.userId);
}
