// "Who is calling": a personal API token (Authorization: Bearer jb_…) or, when the request
// carries none, the session cookie (resolved lazily by the route wrapper). A token request
// never falls back to the cookie, so a bad token is a 401 even from a signed-in browser.
import { useApiToken } from "@/db/api-tokens";
import { getMembership } from "@/db/memberships";
import { Forbidden, Unauthorized } from "@/lib/http/errors";
import { bearerToken, hashApiToken, looksLikeApiToken } from "@/lib/tokens/format";
import type { TokenScope } from "@/lib/tokens/scope";
import type { CurrentSession } from "./session";

export type TokenPrincipal = { kind: "token"; session: CurrentSession; scope: TokenScope };

/**
 * Where tokens are accepted: POST /api/evaluate, the long-run jobs of the same user (start, poll,
 * cancel), and reads under /api/workspaces/<id>/.
 */
export function tokenAccepted(method: string, pathname: string): boolean {
  if (method === "POST" && (pathname === "/api/evaluate" || pathname === "/api/evaluate/jobs")) return true;
  if ((method === "GET" || method === "DELETE") && /^\/api\/evaluate\/jobs\/[^/]+$/.test(pathname)) return true;
  return (method === "GET" || method === "HEAD") && /^\/api\/workspaces\/[^/]+(\/|$)/.test(pathname);
}

/** The token principal of the request, null without an Authorization header; 401/403 for a bad or misplaced token. */
export async function tokenPrincipal(request: Request): Promise<TokenPrincipal | null> {
  const header = request.headers.get("authorization");
  if (header === null) return null;
  const token = bearerToken(header);
  if (!token || !looksLikeApiToken(token)) throw new Unauthorized("the Authorization header must be `Bearer jb_…` with a Joulebook API token");
  const found = await useApiToken({ tokenHash: hashApiToken(token) });
  if (!found) throw new Unauthorized("this API token is not valid");
  if (found.revokedAt) throw new Unauthorized("this API token has been revoked");
  if (!(await getMembership({ workspaceId: found.workspaceId, userId: found.user.id })))
    throw new Unauthorized("this API token's creator is no longer a member of its workspace");
  const { pathname } = new URL(request.url);
  if (!tokenAccepted(request.method, pathname))
    throw new Forbidden("API tokens are accepted only by POST /api/evaluate, /api/evaluate/jobs and GET requests under /api/workspaces/<id>/");
  return {
    kind: "token",
    session: { user: found.user, sessionId: `token:${found.id}` },
    scope: { tokenId: found.id, workspaceId: found.workspaceId, role: found.role },
  };
}
