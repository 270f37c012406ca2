import "server-only";
// For server components and server actions: the session cookie via next/headers.
// Route handlers use the Request instead (lib/http/route.ts), which keeps them testable.
import { cookies, headers } from "next/headers";
import { redirect } from "next/navigation";
import { cache } from "react";
import { SESSION_COOKIE_NAME, validateSessionId, type CurrentSession } from "./session";

export type { CurrentSession, SessionUser } from "./session";

/** The signed-in user, or null. Renews the cookie when lucia says so (where cookies can be set). */
export const getCurrentSession = cache(async (): Promise<CurrentSession | null> => {
  const jar = await cookies();
  const { current, cookie } = await validateSessionId(jar.get(SESSION_COOKIE_NAME)?.value);
  if (cookie) {
    try {
      jar.set(cookie.name, cookie.value, cookie.attributes);
    } catch {
      // Server components cannot set cookies; the next route handler or action renews it.
    }
  }
  return current;
});

/**
 * The signed-in user; otherwise redirects to /sign-in?next=<this page>. `next` defaults to the
 * path that proxy.ts puts in the x-joulebook-path request header.
 */
export async function requireUser(next?: string): Promise<CurrentSession> {
  const current = await getCurrentSession();
  if (current) return current;
  const target = next ?? (await headers()).get("x-joulebook-path") ?? "/";
  redirect(`/sign-in?next=${encodeURIComponent(safeNextPath(target))}`);
}

/** Only same-site relative paths are allowed after sign-in (no open redirect). */
export function safeNextPath(path: string | null | undefined): string {
  if (!path || !path.startsWith("/") || path.startsWith("//") || path.startsWith("/\\")) return "/";
  return path;
}
