// Invitations: owners invite by e-mail; the link is single-use, bound to its address, 7 days.
import { getDb } from "@/db/pool";
import { consumeInvitation, deletePendingInvitation, getInvitationByTokenHash, replaceInvitation, type PendingInvitation } from "@/db/invitations";
import { addMembership, getMembership, listMembers } from "@/db/memberships";
import { getUserById } from "@/db/users";
import { getWorkspace } from "@/db/workspaces";
import { authorizeWorkspace, canGrantRole, isUuid } from "@/lib/authz";
import { appUrl, hashToken, newToken } from "@/lib/auth/tokens";
import { Conflict, Forbidden, Gone, NotFound } from "@/lib/http/errors";
import { trySendMail } from "@/lib/mail/send";
import { invitationMail } from "@/lib/mail/templates";
import type { Role } from "@/lib/schemas/fields";

export const INVITATION_TTL_MS = 7 * 24 * 3600 * 1000;

export async function inviteMember(args: {
  actorId: string;
  workspaceId: string;
  email: string;
  role: Role;
}): Promise<{ invitation: PendingInvitation; mailSent: boolean }> {
  const actor = await authorizeWorkspace({ userId: args.actorId, workspaceId: args.workspaceId, action: "members.manage" });
  if (!canGrantRole(actor.role, args.role)) throw new Forbidden("only owners can grant the owner role");
  const members = await listMembers({ workspaceId: args.workspaceId });
  if (members.some((m) => m.email === args.email)) throw new Conflict(`${args.email} is already a member of this workspace`);
  const { token, hash } = newToken();
  const invitation = await replaceInvitation({
    workspaceId: args.workspaceId,
    email: args.email,
    role: args.role,
    tokenHash: hash,
    invitedBy: args.actorId,
    expiresAt: new Date(Date.now() + INVITATION_TTL_MS),
  });
  const [workspace, inviter] = await Promise.all([getWorkspace({ id: args.workspaceId }), getUserById({ id: args.actorId })]);
  const mail = invitationMail({
    workspaceName: workspace?.name ?? "a workspace",
    inviterName: inviter?.name ?? "A colleague",
    role: args.role,
    link: appUrl(`/invite/${token}`),
    expiresAt: invitation.expiresAt,
  });
  return { invitation, mailSent: await trySendMail({ to: args.email, ...mail }) };
}

export async function revokeInvitation(args: { actorId: string; workspaceId: string; invitationId: string }): Promise<void> {
  await authorizeWorkspace({ userId: args.actorId, workspaceId: args.workspaceId, action: "members.manage" });
  const deleted = isUuid(args.invitationId) && (await deletePendingInvitation(args));
  if (!deleted) throw new NotFound("invitation not found (it may have been accepted already)");
}

async function usableInvitation(token: string) {
  const inv = await getInvitationByTokenHash({ tokenHash: hashToken(token) });
  if (!inv) throw new NotFound("this invitation link is not valid; ask the workspace owner for a new one");
  if (inv.usedAt) throw new Gone("this invitation was already used; ask the workspace owner for a new one");
  if (inv.expiresAt.getTime() <= Date.now()) throw new Gone("this invitation has expired; ask the workspace owner for a new one");
  return inv;
}

export async function describeInvitation(args: { token: string }) {
  const inv = await usableInvitation(args.token);
  return { workspaceName: inv.workspaceName, role: inv.role, email: inv.email, inviter: inv.inviterName ?? "a former member", expiresAt: inv.expiresAt };
}

export async function acceptInvitation(args: { token: string; user: { id: string; email: string } }): Promise<{ workspaceId: string }> {
  const inv = await usableInvitation(args.token);
  if (inv.email !== args.user.email)
    throw new Forbidden(
      `this invitation was sent to ${inv.email}, but you are signed in as ${args.user.email}; sign in with the invited address to accept it`,
    );
  await getDb().transaction(async (tx) => {
    if (!(await consumeInvitation({ id: inv.id, tx }))) throw new Gone("this invitation was already used; ask the workspace owner for a new one");
    // Already a member (e.g. joined by an earlier link): keep the current role.
    if (!(await getMembership({ workspaceId: inv.workspaceId, userId: args.user.id, tx })))
      await addMembership({ workspaceId: inv.workspaceId, userId: args.user.id, role: inv.role, tx });
  });
  return { workspaceId: inv.workspaceId };
}
