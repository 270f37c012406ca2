// Session operations independent of Next (used by route handlers, pages and the collab server).
// Cookies are returned as serialized Set-Cookie values; callers decide how to send them.
import { getLucia, SESSION_COOKIE_NAME } from "./lucia";

export { SESSION_COOKIE_NAME };

export type SessionUser = { id: string; email: string; name: string };
export type CurrentSession = { user: SessionUser; sessionId: string };
export type SessionCookie = { name: string; value: string; attributes: Record<string, unknown>; serialized: string };

function toCookie(c: { name: string; value: string; attributes: object; serialize(): string }): SessionCookie {
  return { name: c.name, value: c.value, attributes: { ...c.attributes }, serialized: c.serialize() };
}

/**
 * Validates a session id. `cookie` is set when the session was renewed (lucia extends a session
 * in the second half of its life) or found invalid (a blank cookie that clears it).
 */
export async function validateSessionId(
  sessionId: string | null | undefined,
): Promise<{ current: CurrentSession | null; cookie: SessionCookie | null }> {
  if (!sessionId) return { current: null, cookie: null };
  const lucia = getLucia();
  const { session, user } = await lucia.validateSession(sessionId);
  if (!session || !user) return { current: null, cookie: toCookie(lucia.createBlankSessionCookie()) };
  const cookie = session.fresh ? toCookie(lucia.createSessionCookie(session.id)) : null;
  return { current: { user: { id: user.id, email: user.email, name: user.name }, sessionId: session.id }, cookie };
}

export function readSessionIdFromCookieHeader(cookieHeader: string | null | undefined): string | null {
  return cookieHeader ? getLucia().readSessionCookie(cookieHeader) : null;
}

/** Creates a session for the user and returns the cookie that carries it. */
export async function startSession(userId: string): Promise<SessionCookie> {
  const lucia = getLucia();
  const session = await lucia.createSession(userId, {});
  return toCookie(lucia.createSessionCookie(session.id));
}

export async function endSession(sessionId: string): Promise<SessionCookie> {
  const lucia = getLucia();
  await lucia.invalidateSession(sessionId);
  return toCookie(lucia.createBlankSessionCookie());
}

export async function endAllSessionsOfUser(userId: string): Promise<void> {
  await getLucia().invalidateUserSessions(userId);
}

export function blankSessionCookie(): SessionCookie {
  return toCookie(getLucia().createBlankSessionCookie());
}
