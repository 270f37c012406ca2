// Authorization matrix: every workspace route × every kind of caller. The expected statuses are
// written out here from the product rules (DESIGN §1: owners manage members; everyone in the
// workspace reads it; non-members learn nothing: 404; signed out: 401) — not derived from lib/authz.
// Adding a route under app/api/workspaces/[workspaceId]? Add a RouteCase to ROUTES with the status
// each caller must get; the last test fails while any exported handler there is missing.
import { describe, expect, it } from "vitest";
import * as invitationIdRoute from "@/app/api/workspaces/[workspaceId]/invitations/[invitationId]/route";
import * as invitationsRoute from "@/app/api/workspaces/[workspaceId]/invitations/route";
import * as memberRoute from "@/app/api/workspaces/[workspaceId]/members/[userId]/route";
import * as membersRoute from "@/app/api/workspaces/[workspaceId]/members/route";
import * as workspaceRoute from "@/app/api/workspaces/[workspaceId]/route";
import { replaceInvitation } from "@/db/invitations";
import { addMembership } from "@/db/memberships";
import { insertUser } from "@/db/users";
import { newToken } from "@/lib/auth/tokens";
import { call } from "./support/http";
import { useMailSink } from "./support/mail";
import { teamWorkspace, type TestUser } from "./support/users";
import { VERSION_ROUTES } from "./versions-matrix-cases";
import { DOCUMENT_ROUTES } from "./documents-matrix-cases";
import { LIBRARY_ROUTES } from "./library-matrix-cases";

useMailSink();

type Who = "owner" | "editor" | "reviewer" | "viewer" | "outsider" | "signedOut";
const WHO: Who[] = ["owner", "editor", "reviewer", "viewer", "outsider", "signedOut"];

type Setup = { workspaceId: string; caller: TestUser | null; ownerId: string; targetId: string; invitationId: string };
type RouteCase = { name: string; send(s: Setup): Promise<Response>; expected: Record<Who, number> };

const readAll = { owner: 200, editor: 200, reviewer: 200, viewer: 200, outsider: 404, signedOut: 401 };
const ownersOnly = (ok: number) => ({ owner: ok, editor: 403, reviewer: 403, viewer: 403, outsider: 404, signedOut: 401 });

const ROUTES: RouteCase[] = [
  {
    name: "GET /api/workspaces/:workspaceId",
    expected: readAll,
    send: (s) => call(workspaceRoute.GET, "GET", "/", { cookie: s.caller?.cookie, params: { workspaceId: s.workspaceId } }),
  },
  {
    name: "GET /api/workspaces/:workspaceId/members",
    expected: readAll,
    send: (s) => call(membersRoute.GET, "GET", "/", { cookie: s.caller?.cookie, params: { workspaceId: s.workspaceId } }),
  },
  {
    name: "POST /api/workspaces/:workspaceId/invitations",
    expected: ownersOnly(201),
    send: (s) =>
      call(invitationsRoute.POST, "POST", "/", {
        cookie: s.caller?.cookie, params: { workspaceId: s.workspaceId }, body: { email: "matrix-guest@example.com", role: "viewer" },
      }),
  },
  {
    name: "DELETE /api/workspaces/:workspaceId/invitations/:invitationId",
    expected: ownersOnly(204),
    send: (s) =>
      call(invitationIdRoute.DELETE, "DELETE", "/", { cookie: s.caller?.cookie, params: { workspaceId: s.workspaceId, invitationId: s.invitationId } }),
  },
  {
    name: "PATCH /api/workspaces/:workspaceId/members/:userId (another member)",
    expected: ownersOnly(200),
    send: (s) =>
      call(memberRoute.PATCH, "PATCH", "/", { cookie: s.caller?.cookie, params: { workspaceId: s.workspaceId, userId: s.targetId }, body: { role: "editor" } }),
  },
  {
    name: "DELETE /api/workspaces/:workspaceId/members/:userId (another member)",
    expected: ownersOnly(204),
    send: (s) => call(memberRoute.DELETE, "DELETE", "/", { cookie: s.caller?.cookie, params: { workspaceId: s.workspaceId, userId: s.targetId } }),
  },
  {
    // Leaving: anyone in the workspace may; the only owner may not (last-owner rule → 409).
    name: "DELETE /api/workspaces/:workspaceId/members/:userId (oneself: leave)",
    expected: { owner: 409, editor: 204, reviewer: 204, viewer: 204, outsider: 404, signedOut: 401 },
    send: (s) =>
      call(memberRoute.DELETE, "DELETE", "/", { cookie: s.caller?.cookie, params: { workspaceId: s.workspaceId, userId: s.caller?.id ?? s.ownerId } }),
  },
  ...VERSION_ROUTES,
  ...DOCUMENT_ROUTES,
  ...LIBRARY_ROUTES,
];

async function setup(who: Who): Promise<Setup> {
  const team = await teamWorkspace();
  // The member acted upon, and a pending invitation, so that owners' requests can succeed.
  const target = await insertUser({ email: `target-${Math.random().toString(36).slice(2)}@example.com`, name: "Target", passwordHash: "x" });
  await addMembership({ workspaceId: team.workspaceId, userId: target!.id, role: "viewer" });
  const invitation = await replaceInvitation({
    workspaceId: team.workspaceId, email: "pending@example.com", role: "viewer", tokenHash: newToken().hash,
    invitedBy: team.owner.id, expiresAt: new Date(Date.now() + 86_400_000),
  });
  const caller = who === "signedOut" ? null : team[who];
  return { workspaceId: team.workspaceId, caller, ownerId: team.owner.id, targetId: target!.id, invitationId: invitation.id };
}

describe("authorization matrix: workspace routes × callers", () => {
  const cases = ROUTES.flatMap((r) => WHO.map((who) => ({ route: r, who, status: r.expected[who] })));
  it.each(cases.map((c) => [c.route.name, c.who, c.status, c] as const))("%s as %s → %i", async (_n, who, status, c) => {
    const s = await setup(who);
    const res = await c.route.send(s);
    expect(res.status, await res.clone().text()).toBe(status);
  });

  it("covers every workspace route handler exported under app/api/workspaces/[workspaceId]", async () => {
    const { readdirSync, statSync } = await import("node:fs");
    const { join } = await import("node:path");
    const found: string[] = [];
    const walk = (dir: string) => {
      for (const e of readdirSync(dir)) {
        const p = join(dir, e);
        if (statSync(p).isDirectory()) walk(p);
        else if (e === "route.ts") found.push(p);
      }
    };
    walk("app/api/workspaces/[workspaceId]");
    const methods: string[] = [];
    for (const file of found) {
      const mod = (await import(/* @vite-ignore */ `@/${file}`)) as Record<string, unknown>;
      for (const m of ["GET", "POST", "PATCH", "PUT", "DELETE"]) if (typeof mod[m] === "function") methods.push(`${m} ${file}`);
    }
    expect(methods.length).toBeGreaterThanOrEqual(6);
    const covered = ROUTES.map((r) => r.name.split(" (")[0]!.replace("/api/workspaces/:workspaceId", "").replace(/:(\w+)/g, "[$1]"));
    for (const m of methods) {
      const [verb, file] = m.split(" ");
      const sub = file!.replace("app/api/workspaces/[workspaceId]", "").replace(/\/route\.ts$/, "");
      expect(covered, `${m} is missing from the matrix`).toContain(`${verb} ${sub}`);
    }
  });
});
