// Workspaces, invitations, roles and the last-owner rules through the route handlers.
import { and, count, eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import * as acceptRoute from "@/app/api/invitations/[token]/accept/route";
import * as invitationRoute from "@/app/api/invitations/[token]/route";
import * as meRoute from "@/app/api/me/route";
import * as invitationsRoute from "@/app/api/workspaces/[workspaceId]/invitations/route";
import * as invitationIdRoute from "@/app/api/workspaces/[workspaceId]/invitations/[invitationId]/route";
import * as memberRoute from "@/app/api/workspaces/[workspaceId]/members/[userId]/route";
import * as membersRoute from "@/app/api/workspaces/[workspaceId]/members/route";
import * as workspaceRoute from "@/app/api/workspaces/[workspaceId]/route";
import { getMembership } from "@/db/memberships";
import { getDb } from "@/db/pool";
import { invitations, memberships } from "@/db/schema";
import { hashToken } from "@/lib/auth/tokens";
import { bodyOf, call } from "./support/http";
import { lastMailTo, linkToken, useMailSink } from "./support/mail";
import { newUser, newWorkspace, teamWorkspace, type TestUser } from "./support/users";

useMailSink();

const invite = (by: TestUser, workspaceId: string, email: string, role: string) =>
  call(invitationsRoute.POST, "POST", `/api/workspaces/${workspaceId}/invitations`, { cookie: by.cookie, body: { email, role }, params: { workspaceId } });
const accept = (who: TestUser | null, token: string) =>
  call(acceptRoute.POST, "POST", `/api/invitations/${token}/accept`, { cookie: who?.cookie, params: { token } });
const describeInvitation = (token: string) => call(invitationRoute.GET, "GET", `/api/invitations/${token}`, { params: { token } });
const patchRole = (by: TestUser, workspaceId: string, userId: string, role: string) =>
  call(memberRoute.PATCH, "PATCH", `/api/workspaces/${workspaceId}/members/${userId}`, { cookie: by.cookie, body: { role }, params: { workspaceId, userId } });
const removeMember = (by: TestUser, workspaceId: string, userId: string) =>
  call(memberRoute.DELETE, "DELETE", `/api/workspaces/${workspaceId}/members/${userId}`, { cookie: by.cookie, params: { workspaceId, userId } });
const roleOf = async (workspaceId: string, userId: string) => (await getMembership({ workspaceId, userId }))?.role ?? null;
const invitationCount = async (workspaceId: string) =>
  (await getDb().select({ n: count() }).from(invitations).where(eq(invitations.workspaceId, workspaceId)))[0]!.n;

async function invitedToken(owner: TestUser, workspaceId: string, email: string, role = "reviewer"): Promise<string> {
  const res = await invite(owner, workspaceId, email, role);
  expect(res.status).toBe(201);
  return linkToken((await lastMailTo(email.toLowerCase())).text, "/invite/");
}

describe("workspaces", () => {
  it("the creator becomes owner; /api/me and GET workspace say so", async () => {
    const u = await newUser("creator");
    const workspaceId = await newWorkspace(u, "Delivery van study");
    const me = await bodyOf(await call(meRoute.GET, "GET", "/api/me", { cookie: u.cookie }));
    expect(me.workspaces).toEqual([{ id: workspaceId, name: "Delivery van study", role: "owner" }]);
    const ws = await bodyOf(await call(workspaceRoute.GET, "GET", "/", { cookie: u.cookie, params: { workspaceId } }));
    expect(ws).toEqual({ workspace: { id: workspaceId, name: "Delivery van study" }, role: "owner" });
  });
});

describe("invitations", () => {
  it("invite → mail → describe → accept by the invited address; the member gets the role", async () => {
    const owner = await newUser("inviter");
    const workspaceId = await newWorkspace(owner, "Hybrid bus");
    const guest = await newUser("guest");
    const token = await invitedToken(owner, workspaceId, guest.email.toUpperCase(), "reviewer");
    const mail = await lastMailTo(guest.email);
    expect(mail.subject).toBe('Join "Hybrid bus" on Joulebook');
    expect(mail.text).toContain(`http://127.0.0.1:3210/invite/${token}`);

    const info = await describeInvitation(token);
    expect(info.status).toBe(200);
    expect(await bodyOf(info)).toMatchObject({ workspaceName: "Hybrid bus", role: "reviewer", email: guest.email, inviter: owner.name });

    const members = await bodyOf(await call(membersRoute.GET, "GET", "/", { cookie: owner.cookie, params: { workspaceId } }));
    expect(members.invitations).toHaveLength(1);

    expect(await accept(null, token).then((r) => r.status)).toBe(401);
    const res = await accept(guest, token);
    expect(res.status).toBe(200);
    expect(await bodyOf(res)).toEqual({ workspaceId });
    expect(await roleOf(workspaceId, guest.id)).toBe("reviewer");
    // The stored row holds the hash, never the token.
    const [row] = await getDb().select().from(invitations).where(eq(invitations.workspaceId, workspaceId));
    expect(row!.tokenHash).toBe(hashToken(token));
  });

  it("expires after 7 days", async () => {
    const owner = await newUser("ttl");
    const workspaceId = await newWorkspace(owner);
    await invitedToken(owner, workspaceId, "ttl-guest@example.com");
    const [row] = await getDb().select().from(invitations).where(eq(invitations.workspaceId, workspaceId));
    const days = (row!.expiresAt.getTime() - row!.createdAt.getTime()) / 86_400_000;
    expect(days).toBeCloseTo(7, 3);
  });

  it("a used invitation is refused (410) and adds nothing", async () => {
    const owner = await newUser("reuse");
    const workspaceId = await newWorkspace(owner);
    const guest = await newUser("reuser");
    const token = await invitedToken(owner, workspaceId, guest.email);
    expect((await accept(guest, token)).status).toBe(200);
    await removeMember(owner, workspaceId, guest.id);
    const again = await accept(guest, token);
    expect(again.status).toBe(410);
    expect((await bodyOf(again)).error).toMatch(/already used/);
    expect(await roleOf(workspaceId, guest.id)).toBeNull();
    expect((await describeInvitation(token)).status).toBe(410);
  });

  it("an expired invitation is refused (410) and adds nothing", async () => {
    const owner = await newUser("exp");
    const workspaceId = await newWorkspace(owner);
    const guest = await newUser("late");
    const token = await invitedToken(owner, workspaceId, guest.email);
    await getDb().update(invitations).set({ expiresAt: sql`now() - interval '1 minute'` }).where(eq(invitations.workspaceId, workspaceId));
    const res = await accept(guest, token);
    expect(res.status).toBe(410);
    expect((await bodyOf(res)).error).toMatch(/expired/);
    expect(await roleOf(workspaceId, guest.id)).toBeNull();
  });

  it("a forged or malformed token is a 404", async () => {
    const guest = await newUser("forger");
    expect((await accept(guest, "B".repeat(43))).status).toBe(404);
    expect((await accept(guest, "short")).status).toBe(404);
    expect((await describeInvitation("C".repeat(43))).status).toBe(404);
  });

  it("another account cannot accept it: 403 with a clear message, nothing written", async () => {
    const owner = await newUser("bound");
    const workspaceId = await newWorkspace(owner);
    const intended = await newUser("intended");
    const thief = await newUser("thief");
    const token = await invitedToken(owner, workspaceId, intended.email, "editor");
    const res = await accept(thief, token);
    expect(res.status).toBe(403);
    expect((await bodyOf(res)).error).toBe(
      `this invitation was sent to ${intended.email}, but you are signed in as ${thief.email}; sign in with the invited address to accept it`,
    );
    expect(await roleOf(workspaceId, thief.id)).toBeNull();
    // Still usable by the right person.
    expect((await accept(intended, token)).status).toBe(200);
    expect(await roleOf(workspaceId, intended.id)).toBe("editor");
  });

  it("inviting an existing member is a 409", async () => {
    const t = await teamWorkspace();
    const res = await invite(t.owner, t.workspaceId, t.viewer.email, "editor");
    expect(res.status).toBe(409);
    expect((await bodyOf(res)).error).toMatch(/already a member/);
  });

  it("re-inviting the same address replaces the earlier link", async () => {
    const owner = await newUser("reinvite");
    const workspaceId = await newWorkspace(owner);
    const guest = await newUser("twice");
    const first = await invitedToken(owner, workspaceId, guest.email, "viewer");
    const second = await invitedToken(owner, workspaceId, guest.email, "editor");
    expect(await invitationCount(workspaceId)).toBe(1);
    expect((await accept(guest, first)).status).toBe(404);
    expect((await accept(guest, second)).status).toBe(200);
    expect(await roleOf(workspaceId, guest.id)).toBe("editor");
  });

  it("a revoked invitation can no longer be accepted", async () => {
    const owner = await newUser("revoker");
    const workspaceId = await newWorkspace(owner);
    const guest = await newUser("revoked");
    const token = await invitedToken(owner, workspaceId, guest.email);
    const [row] = await getDb().select().from(invitations).where(eq(invitations.workspaceId, workspaceId));
    const res = await call(invitationIdRoute.DELETE, "DELETE", "/", { cookie: owner.cookie, params: { workspaceId, invitationId: row!.id } });
    expect(res.status).toBe(204);
    expect((await accept(guest, token)).status).toBe(404);
  });
});

describe("role escalation through the API", () => {
  it.each(["editor", "reviewer", "viewer"] as const)("a %s cannot make themselves owner (403, role unchanged)", async (role) => {
    const t = await teamWorkspace();
    const res = await patchRole(t[role], t.workspaceId, t[role].id, "owner");
    expect(res.status).toBe(403);
    expect(await roleOf(t.workspaceId, t[role].id)).toBe(role);
  });

  it("an editor cannot invite anyone, not even as viewer, and no invitation is stored", async () => {
    const t = await teamWorkspace();
    for (const role of ["owner", "viewer"]) expect((await invite(t.editor, t.workspaceId, `sidekick-${role}@example.com`, role)).status).toBe(403);
    expect(await invitationCount(t.workspaceId)).toBe(0);
  });

  it("an editor cannot demote the owner or remove another member", async () => {
    const t = await teamWorkspace();
    expect((await patchRole(t.editor, t.workspaceId, t.owner.id, "viewer")).status).toBe(403);
    expect((await removeMember(t.editor, t.workspaceId, t.viewer.id)).status).toBe(403);
    expect(await roleOf(t.workspaceId, t.owner.id)).toBe("owner");
    expect(await roleOf(t.workspaceId, t.viewer.id)).toBe("viewer");
  });

  it("an unknown role is a 422", async () => {
    const t = await teamWorkspace();
    const res = await patchRole(t.owner, t.workspaceId, t.viewer.id, "admin");
    expect(res.status).toBe(422);
    expect((await bodyOf(res)).fields.role).toMatch(/owner, editor, reviewer, viewer/);
  });

  it("an owner can grant owner, change roles and remove members", async () => {
    const t = await teamWorkspace();
    expect((await patchRole(t.owner, t.workspaceId, t.editor.id, "owner")).status).toBe(200);
    expect(await roleOf(t.workspaceId, t.editor.id)).toBe("owner");
    const res = await patchRole(t.owner, t.workspaceId, t.viewer.id, "reviewer");
    expect((await bodyOf(res)).member).toMatchObject({ userId: t.viewer.id, role: "reviewer" });
    expect((await removeMember(t.owner, t.workspaceId, t.reviewer.id)).status).toBe(204);
    expect(await roleOf(t.workspaceId, t.reviewer.id)).toBeNull();
  });
});

describe("the last owner", () => {
  it("cannot be demoted (409) but can once there is a second owner", async () => {
    const t = await teamWorkspace();
    const res = await patchRole(t.owner, t.workspaceId, t.owner.id, "editor");
    expect(res.status).toBe(409);
    expect((await bodyOf(res)).error).toBe("the last owner cannot be demoted");
    expect(await roleOf(t.workspaceId, t.owner.id)).toBe("owner");
    await patchRole(t.owner, t.workspaceId, t.editor.id, "owner");
    expect((await patchRole(t.owner, t.workspaceId, t.owner.id, "editor")).status).toBe(200);
    // Now the former editor is the only owner and is protected in turn.
    expect((await patchRole(t.editor, t.workspaceId, t.editor.id, "viewer")).status).toBe(409);
  });

  it("cannot leave (409); any other member can leave", async () => {
    const t = await teamWorkspace();
    const res = await removeMember(t.owner, t.workspaceId, t.owner.id);
    expect(res.status).toBe(409);
    expect((await bodyOf(res)).error).toMatch(/last owner cannot leave/);
    expect((await removeMember(t.viewer, t.workspaceId, t.viewer.id)).status).toBe(204);
    expect(await roleOf(t.workspaceId, t.viewer.id)).toBeNull();
    const members = await getDb().select().from(memberships).where(and(eq(memberships.workspaceId, t.workspaceId), eq(memberships.role, "owner")));
    expect(members).toHaveLength(1);
  });

  // Whichever runs second finds either no owner right left (403: it was demoted first) or
  // itself the last owner's demoter (409); never both demoted.
  it("two owners demoting each other at the same time leave one owner", async () => {
    const t = await teamWorkspace();
    await patchRole(t.owner, t.workspaceId, t.editor.id, "owner");
    const [a, b] = await Promise.all([
      patchRole(t.owner, t.workspaceId, t.editor.id, "viewer"),
      patchRole(t.editor, t.workspaceId, t.owner.id, "viewer"),
    ]);
    const statuses = [a.status, b.status].sort();
    expect(statuses[0]).toBe(200);
    expect([403, 409]).toContain(statuses[1]);
    const owners = await getDb().select().from(memberships).where(and(eq(memberships.workspaceId, t.workspaceId), eq(memberships.role, "owner")));
    expect(owners).toHaveLength(1);
  });
});
