// Personal API tokens: shown once, stored hashed, scoped to one workspace with a role no higher
// than the creator's, revocable, last-used time; accepted by POST /api/evaluate and workspace reads.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import * as tokensRoute from "@/app/api/tokens/route";
import * as tokenRoute from "@/app/api/tokens/[tokenId]/route";
import * as evaluateRoute from "@/app/api/evaluate/route";
import * as jobsRoute from "@/app/api/evaluate/jobs/route";
import * as jobRoute from "@/app/api/evaluate/jobs/[id]/route";
import * as workspaceRoute from "@/app/api/workspaces/[workspaceId]/route";
import * as membersRoute from "@/app/api/workspaces/[workspaceId]/members/route";
import * as libraryRoute from "@/app/api/workspaces/[workspaceId]/library/route";
import * as documentsRoute from "@/app/api/workspaces/[workspaceId]/documents/route";
import * as invitationsRoute from "@/app/api/workspaces/[workspaceId]/invitations/route";
import * as memberRoute from "@/app/api/workspaces/[workspaceId]/members/[userId]/route";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { apiTokens } from "@/db/schema-api-tokens";
import { hashApiToken } from "@/lib/tokens/format";
import { bodyOf, call } from "./support/http";
import { newUser, newWorkspace, teamWorkspace } from "./support/users";

const scenario = JSON.parse(readFileSync(new URL("../../examples/bev.json", import.meta.url), "utf8"));

async function mint(cookie: string, workspaceId: string, role: string, name = "script") {
  const res = await call(tokensRoute.POST, "POST", "/api/tokens", { cookie, body: { workspaceId, name, role } });
  return { res, body: await bodyOf(res) };
}
const bearer = (token: string) => ({ authorization: `Bearer ${token}` });
const evaluate = (token: string) =>
  call(evaluateRoute.POST, "POST", "/api/evaluate", { body: scenario, headers: bearer(token), origin: null });
const readWorkspace = (token: string, workspaceId: string) =>
  call(workspaceRoute.GET, "GET", `/api/workspaces/${workspaceId}`, { headers: bearer(token), params: { workspaceId } });

describe("personal API tokens", () => {
  it("is shown once, stored only as its SHA-256, and listed without the secret", async () => {
    const t = await teamWorkspace();
    const { res, body } = await mint(t.editor.cookie, t.workspaceId, "viewer", "nightly runs");
    expect(res.status).toBe(201);
    expect(body.token).toMatch(/^jb_[A-Za-z0-9_-]{43}$/);
    const rows = await getDb().select().from(apiTokens).where(eq(apiTokens.userId, t.editor.id));
    expect(rows).toHaveLength(1);
    expect(rows[0].tokenHash).toBe(hashApiToken(body.token));
    expect(JSON.stringify(rows[0])).not.toContain(body.token.slice(3));
    const list = await bodyOf(await call(tokensRoute.GET, "GET", "/api/tokens", { cookie: t.editor.cookie }));
    expect(list.tokens).toHaveLength(1);
    expect(list.tokens[0]).toMatchObject({ name: "nightly runs", role: "viewer", workspaceId: t.workspaceId, prefix: body.token.slice(0, 9), lastUsedAt: null, revokedAt: null });
    expect(JSON.stringify(list)).not.toContain(body.token);
  });

  it("cannot get a role above its creator's", async () => {
    const t = await teamWorkspace();
    const { res, body } = await mint(t.reviewer.cookie, t.workspaceId, "editor");
    expect(res.status).toBe(422);
    expect(body.fields.role).toBe("your role in this workspace is reviewer; a token cannot have a higher role");
    expect((await mint(t.outsider.cookie, t.workspaceId, "viewer")).res.status).toBe(404);
  });

  it("evaluates a scenario with POST /api/evaluate (no cookie, no Origin) and stamps last_used_at", async () => {
    const t = await teamWorkspace();
    const { body } = await mint(t.viewer.cookie, t.workspaceId, "viewer");
    const res = await evaluate(body.token);
    expect(res.status).toBe(200);
    const result = await bodyOf(res);
    expect(result.kpi.feasible).toBe(true);
    const [row] = await getDb().select().from(apiTokens).where(eq(apiTokens.tokenHash, hashApiToken(body.token)));
    expect(row.lastUsedAt).toBeInstanceOf(Date);
  });

  it("starts and polls a long-run job (POST /api/evaluate/jobs, GET /api/evaluate/jobs/:id)", async () => {
    const t = await teamWorkspace();
    const { body } = await mint(t.viewer.cookie, t.workspaceId, "viewer");
    const started = await call(jobsRoute.POST, "POST", "/api/evaluate/jobs", { body: { scenario }, headers: bearer(body.token), origin: null });
    expect(started.status).toBe(202);
    const { jobId } = await bodyOf(started);
    const polled = await call(jobRoute.GET, "GET", `/api/evaluate/jobs/${jobId}`, { headers: bearer(body.token), params: { id: jobId } });
    expect(polled.status).toBe(200);
    // the job belongs to the token's creator: their session sees it too, another user does not
    expect((await call(jobRoute.GET, "GET", `/api/evaluate/jobs/${jobId}`, { cookie: t.viewer.cookie, params: { id: jobId } })).status).toBe(200);
    expect((await call(jobRoute.GET, "GET", `/api/evaluate/jobs/${jobId}`, { cookie: t.editor.cookie, params: { id: jobId } })).status).toBe(404);
  });

  it("reads its own workspace; another workspace of the same user is 404", async () => {
    const owner = await newUser("owner");
    const a = await newWorkspace(owner, "A");
    const b = await newWorkspace(owner, "B");
    const { body } = await mint(owner.cookie, a, "viewer");
    const ok = await readWorkspace(body.token, a);
    expect(ok.status).toBe(200);
    expect((await bodyOf(ok)).role).toBe("viewer"); // capped to the token's role, though the user owns A
    const other = await readWorkspace(body.token, b);
    expect(other.status).toBe(404);
    const docs = await call(documentsRoute.GET, "GET", `/api/workspaces/${a}/documents`, { headers: bearer(body.token), params: { workspaceId: a } });
    expect(docs.status).toBe(200);
    const library = await call(libraryRoute.GET, "GET", `/api/workspaces/${a}/library`, { headers: bearer(body.token), params: { workspaceId: a } });
    expect(library.status).toBe(200);
    const upload = await call(libraryRoute.POST, "POST", `/api/workspaces/${a}/library`, { body: { kind: "cycle", text: "0\n1\n" }, headers: bearer(body.token), params: { workspaceId: a }, origin: null });
    expect(upload.status).toBe(403);
    const members = await call(membersRoute.GET, "GET", `/api/workspaces/${b}/members`, { headers: bearer(body.token), params: { workspaceId: b } });
    expect(members.status).toBe(404);
  });

  it("is refused for writes and for routes outside its reach (403), even with an owner role", async () => {
    const owner = await newUser("owner");
    const ws = await newWorkspace(owner);
    const { body } = await mint(owner.cookie, ws, "owner");
    const invite = await call(invitationsRoute.POST, "POST", `/api/workspaces/${ws}/invitations`, {
      body: { email: "x@example.com", role: "viewer" }, headers: bearer(body.token), params: { workspaceId: ws }, origin: null,
    });
    expect(invite.status).toBe(403);
    expect((await bodyOf(invite)).error).toBe("API tokens are accepted only by POST /api/evaluate, /api/evaluate/jobs and GET requests under /api/workspaces/<id>/");
    const mintWithToken = await call(tokensRoute.POST, "POST", "/api/tokens", { body: { workspaceId: ws, name: "x", role: "viewer" }, headers: bearer(body.token), origin: null });
    expect(mintWithToken.status).toBe(403);
  });

  it("is 401 once revoked, and for unknown or malformed tokens", async () => {
    const t = await teamWorkspace();
    const { body } = await mint(t.editor.cookie, t.workspaceId, "editor");
    expect((await evaluate(body.token)).status).toBe(200);
    const del = await call(tokenRoute.DELETE, "DELETE", `/api/tokens/${body.item.id}`, { cookie: t.editor.cookie, params: { tokenId: body.item.id } });
    expect(del.status).toBe(204);
    const after = await evaluate(body.token);
    expect(after.status).toBe(401);
    expect((await bodyOf(after)).error).toBe("this API token has been revoked");
    expect((await readWorkspace(body.token, t.workspaceId)).status).toBe(401);
    const unknown = await evaluate("jb_" + "A".repeat(43));
    expect((await bodyOf(unknown)).error).toBe("this API token is not valid");
    const malformed = await call(evaluateRoute.POST, "POST", "/api/evaluate", { body: scenario, headers: { authorization: "Bearer nope" }, origin: null });
    expect(malformed.status).toBe(401);
    // someone else cannot revoke it (404, no hint that it exists)
    const { body: other } = await mint(t.viewer.cookie, t.workspaceId, "viewer");
    const foreign = await call(tokenRoute.DELETE, "DELETE", `/api/tokens/${other.item.id}`, { cookie: t.editor.cookie, params: { tokenId: other.item.id } });
    expect(foreign.status).toBe(404);
  });

  it("follows its creator: demoted below the token's role caps it, removed from the workspace ends it", async () => {
    const t = await teamWorkspace();
    const { body } = await mint(t.editor.cookie, t.workspaceId, "editor");
    const demote = await call(memberRoute.PATCH, "PATCH", `/api/workspaces/${t.workspaceId}/members/${t.editor.id}`, {
      cookie: t.owner.cookie, body: { role: "viewer" }, params: { workspaceId: t.workspaceId, userId: t.editor.id },
    });
    expect(demote.status).toBe(200);
    expect((await bodyOf(await readWorkspace(body.token, t.workspaceId))).role).toBe("viewer");
    const remove = await call(memberRoute.DELETE, "DELETE", `/api/workspaces/${t.workspaceId}/members/${t.editor.id}`, {
      cookie: t.owner.cookie, params: { workspaceId: t.workspaceId, userId: t.editor.id },
    });
    expect(remove.status).toBe(204);
    const gone = await readWorkspace(body.token, t.workspaceId);
    expect(gone.status).toBe(401);
    expect((await bodyOf(gone)).error).toBe("this API token's creator is no longer a member of its workspace");
  });
});

describe("POST /api/evaluate with a library cycle", () => {
  it("replaces cycle.library_id by the item's samples: the token's workspace, or ?workspace= for a session", async () => {
    const t = await teamWorkspace();
    const other = await teamWorkspace();
    const text = "time [s],speed [km/h]\n0,0\n10,36\n20,36\n30,0\n";
    const confirmation = { delimiter: ",", decimal: ".", header_rows: 1, time: { column: 1, unit: "s" }, speed: { column: 2, unit: "km/h" }, grade: null };
    const saved = await call(libraryRoute.POST, "POST", "/", { cookie: t.editor.cookie, body: { kind: "cycle", text, confirmation, name: "Depot" }, params: { workspaceId: t.workspaceId } });
    const itemId = (await bodyOf(saved)).item.id;
    const withLibrary = { ...scenario, cycle: { library_id: itemId } };
    const { body } = await mint(t.viewer.cookie, t.workspaceId, "viewer");
    const res = await call(evaluateRoute.POST, "POST", "/api/evaluate", { body: withLibrary, headers: bearer(body.token), origin: null });
    expect(res.status).toBe(200);
    // trapezoids 50 + 100 + 50 m
    expect((await bodyOf(res)).kpi.distance_km).toBeCloseTo(0.2, 12);
    const session = await call(evaluateRoute.POST, "POST", `/api/evaluate?workspace=${t.workspaceId}`, { body: withLibrary, cookie: t.reviewer.cookie });
    expect(session.status).toBe(200);
    const noWorkspace = await call(evaluateRoute.POST, "POST", "/api/evaluate", { body: withLibrary, cookie: t.reviewer.cookie });
    expect(noWorkspace.status).toBe(422);
    expect((await bodyOf(noWorkspace)).fields["cycle.library_id"]).toBe("name the workspace of the library: POST /api/evaluate?workspace=<id> (an API token uses its own)");
    // another workspace's token cannot reach the item: it is not in that token's library
    const { body: foreign } = await mint(other.owner.cookie, other.workspaceId, "viewer");
    const denied = await call(evaluateRoute.POST, "POST", "/api/evaluate", { body: withLibrary, headers: bearer(foreign.token), origin: null });
    expect(denied.status).toBe(422);
    expect((await bodyOf(denied)).fields["cycle.library_id"]).toBe(`no item "${itemId}" in this workspace's library`);
    // an outsider naming the workspace learns nothing
    expect((await call(evaluateRoute.POST, "POST", `/api/evaluate?workspace=${t.workspaceId}`, { body: withLibrary, cookie: t.outsider.cookie })).status).toBe(404);
  });
});
