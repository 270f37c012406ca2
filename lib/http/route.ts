// The one wrapper every route handler goes through: Origin check for non-GET, JSON body with a
// size cap and zod validation, the session from the request's cookie (renewed when due), and
// typed errors mapped to statuses. Unknown errors are logged here and answered with a bare 500.
import type { z } from "zod";
import {
  readSessionIdFromCookieHeader,
  validateSessionId,
  type CurrentSession,
  type SessionCookie,
} from "@/lib/auth/session";
import { clientIp } from "./client-ip";
import { DEFAULT_BODY_LIMIT_BYTES, readJsonBody } from "./body";
import { HttpError, Unauthorized, Unprocessable } from "./errors";
import { assertSameOrigin } from "./origin";
import { tokenPrincipal, type TokenPrincipal } from "@/lib/auth/principal";
import { runWithTokenScope } from "@/lib/tokens/scope";

export type RouteContext<P> = {
  request: Request;
  params: P;
  ip: string;
  /** The signed-in user or null (validated once per request). */
  session(): Promise<CurrentSession | null>;
  /** The signed-in user; throws Unauthorized (401) when signed out. */
  requireUser(): Promise<CurrentSession>;
  /** Adds a Set-Cookie to the response (session start, end, renewal). */
  setCookie(cookie: SessionCookie): void;
};

type Options<S extends z.ZodType | undefined> = { body?: S; maxBodyBytes?: number };
type Body<S> = S extends z.ZodType ? z.output<S> : undefined;
type Handler<P, S> = (ctx: RouteContext<P>, body: Body<S>) => Promise<Response>;
type NextContext<P> = { params: Promise<P> };

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

export function route<P = Record<string, never>, S extends z.ZodType | undefined = undefined>(
  options: Options<S>,
  handler: Handler<P, S>,
): (request: Request, context: NextContext<P>) => Promise<Response> {
  return async (request, context) => {
    const cookies: SessionCookie[] = [];
    try {
      // A bearer token is not sent by browsers on their own, so token requests skip the Origin check.
      const token = await tokenPrincipal(request);
      if (!token && !SAFE_METHODS.has(request.method)) assertSameOrigin(request);
      const params = ((await context?.params) ?? {}) as P;
      const body = options.body ? parseBody(options.body, await readJsonBody(request, options.maxBodyBytes ?? DEFAULT_BODY_LIMIT_BYTES)) : undefined;
      const ctx = makeContext(request, params, cookies, token);
      const run = () => handler(ctx, body as Body<S>);
      const response = token ? await runWithTokenScope(token.scope, run) : await run();
      return withCookies(response, cookies);
    } catch (error) {
      return withCookies(errorResponse(error, request), cookies);
    }
  };
}

function makeContext<P>(request: Request, params: P, cookies: SessionCookie[], token: TokenPrincipal | null): RouteContext<P> {
  let pending: Promise<CurrentSession | null> | undefined = token ? Promise.resolve(token.session) : undefined;
  const session = () => {
    pending ??= validateSessionId(readSessionIdFromCookieHeader(request.headers.get("cookie"))).then((r) => {
      if (r.cookie) cookies.push(r.cookie);
      return r.current;
    });
    return pending;
  };
  return {
    request,
    params,
    ip: clientIp(request),
    session,
    requireUser: async () => {
      const current = await session();
      if (!current) throw new Unauthorized();
      return current;
    },
    setCookie: (cookie) => {
      // A later cookie of the same name replaces a renewal queued earlier in the request.
      for (let i = cookies.length - 1; i >= 0; i--) if (cookies[i]?.name === cookie.name) cookies.splice(i, 1);
      cookies.push(cookie);
    },
  };
}

function parseBody<S extends z.ZodType>(schema: S, raw: unknown): z.output<S> {
  const result = schema.safeParse(raw);
  if (result.success) return result.data;
  throw new Unprocessable(fieldMessages(result.error.issues));
}

export function fieldMessages(issues: readonly { path: readonly PropertyKey[]; message: string }[]): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of issues) {
    const key = issue.path.map(String).join(".") || "_";
    fields[key] ??= issue.message;
  }
  return fields;
}

function errorResponse(error: unknown, request: Request): Response {
  if (error instanceof HttpError) return json(error.body(), error.status, error.headers);
  console.error(`[joulebook] ${request.method} ${new URL(request.url).pathname} failed:`, error);
  return json({ error: "something went wrong on our side; please try again" }, 500);
}

function withCookies(response: Response, cookies: SessionCookie[]): Response {
  for (const cookie of cookies) response.headers.append("Set-Cookie", cookie.serialized);
  return response;
}

export function json(data: unknown, status = 200, headers: Record<string, string> = {}): Response {
  return new Response(JSON.stringify(data), {
    status,
    headers: { "Content-Type": "application/json; charset=utf-8", "Cache-Control": "no-store", ...headers },
  });
}

export function noContent(): Response {
  return new Response(null, { status: 204, headers: { "Cache-Control": "no-store" } });
}
