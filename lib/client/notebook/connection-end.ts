// When the collaboration server ends a connection for good, and what to tell the person.
// The server (server/collab/server.ts, admission.ts) refuses an upgrade with HTTP 401 (no valid
// session), 403 (wrong Origin) or 404 (no such document, or not a member), and closes an open
// connection on its periodic re-check with 4400 + that status: 4401 session ended, 4404 membership
// removed or document deleted (4403 by the same rule). y-websocket treats 4400–4499 as final.

export type EndedState = "session-ended" | "no-access" | "closed";

export const ENDED_MESSAGES: Record<EndedState, string> = {
  "session-ended": "Your session ended — sign in again",
  "no-access": "You no longer have access to this document",
  closed: "The collaboration server closed the connection — reload the page to try again",
};

/** The final state for a WebSocket close code, or null when reconnecting may help. */
export function endedByCloseCode(code: number): EndedState | null {
  if (code === 4401) return "session-ended";
  if (code === 4403 || code === 4404) return "no-access";
  // Any other 44xx is final too (y-websocket's convention): say so without guessing why.
  if (code >= 4400 && code < 4500) return "closed";
  return null;
}

/** The final state for the app's answer about the document (same rules as the upgrade), or null. */
export function endedByHttpStatus(status: number): EndedState | null {
  if (status === 401) return "session-ended";
  if (status === 403 || status === 404) return "no-access";
  return null;
}
