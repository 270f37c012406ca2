import { and, asc, eq, gt, isNull } from "drizzle-orm";
import type { Role } from "@/lib/schemas/fields";
import { getDb, type Tx } from "./pool";
import { invitations, users, workspaces } from "./schema";

export type InvitationRow = typeof invitations.$inferSelect;
export type PendingInvitation = { id: string; email: string; role: Role; expiresAt: Date };

export async function listPendingInvitations(args: { workspaceId: string }): Promise<PendingInvitation[]> {
  return getDb()
    .select({ id: invitations.id, email: invitations.email, role: invitations.role, expiresAt: invitations.expiresAt })
    .from(invitations)
    .where(and(eq(invitations.workspaceId, args.workspaceId), isNull(invitations.usedAt), gt(invitations.expiresAt, new Date())))
    .orderBy(asc(invitations.createdAt));
}

/** Replaces any unused invitation for the same address in the workspace (the newest link wins). */
export async function replaceInvitation(args: {
  workspaceId: string;
  email: string;
  role: Role;
  tokenHash: string;
  invitedBy: string;
  expiresAt: Date;
}): Promise<PendingInvitation> {
  return getDb().transaction(async (tx) => {
    await tx
      .delete(invitations)
      .where(and(eq(invitations.workspaceId, args.workspaceId), eq(invitations.email, args.email), isNull(invitations.usedAt)));
    const [row] = await tx
      .insert(invitations)
      .values(args)
      .returning({ id: invitations.id, email: invitations.email, role: invitations.role, expiresAt: invitations.expiresAt });
    if (!row) throw new Error("invitation insert returned nothing");
    return row;
  });
}

/** Deletes an unused invitation; false when there was none with that id in the workspace. */
export async function deletePendingInvitation(args: { workspaceId: string; invitationId: string }): Promise<boolean> {
  const rows = await getDb()
    .delete(invitations)
    .where(and(eq(invitations.id, args.invitationId), eq(invitations.workspaceId, args.workspaceId), isNull(invitations.usedAt)))
    .returning({ id: invitations.id });
  return rows.length > 0;
}

export type InvitationDetails = InvitationRow & { workspaceName: string; inviterName: string | null };

export async function getInvitationByTokenHash(args: { tokenHash: string }): Promise<InvitationDetails | null> {
  const rows = await getDb()
    .select({ inv: invitations, workspaceName: workspaces.name, inviterName: users.name })
    .from(invitations)
    .innerJoin(workspaces, eq(workspaces.id, invitations.workspaceId))
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(eq(invitations.tokenHash, args.tokenHash))
    .limit(1);
  const r = rows[0];
  return r ? { ...r.inv, workspaceName: r.workspaceName, inviterName: r.inviterName } : null;
}

/** Marks the invitation used if it still is usable. Atomic: a link is accepted at most once. */
export async function consumeInvitation(args: { id: string; tx: Tx }): Promise<boolean> {
  const now = new Date();
  const rows = await args.tx
    .update(invitations)
    .set({ usedAt: now })
    .where(and(eq(invitations.id, args.id), isNull(invitations.usedAt), gt(invitations.expiresAt, now)))
    .returning({ id: invitations.id });
  return rows.length > 0;
}
