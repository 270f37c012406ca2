// Who may open a document over the websocket, decided at the HTTP upgrade (before any sync):
// Origin must be the app's (403), the session cookie must be valid (401), the document must exist
// and the user must be a member of its workspace (404, so ids do not leak). Editors and owners
// write; reviewers and viewers, and everyone on an archived document, are read-only.
import type { IncomingMessage } from "node:http";
import { getDocument } from "@/db/documents";
import { readSessionIdFromCookieHeader, validateSessionId } from "@/lib/auth/session";
import { authorizeWorkspace, can, isUuid } from "@/lib/authz";
import { HttpError } from "@/lib/http/errors";

export type Admission =
  | { ok: true; documentId: string; userId: string; sessionId: string; writable: boolean }
  | { ok: false; status: 401 | 403 | 404; reason: string };

/** The document id is the last path segment (y-websocket connects to `${serverUrl}/${room}`). */
export function documentIdFromUrl(url: string | undefined): string | null {
  const path = new URL(url ?? "/", "http://collab.invalid").pathname;
  const last = path.split("/").filter(Boolean).pop() ?? "";
  return isUuid(last) ? last.toLowerCase() : null;
}

export async function admit(req: IncomingMessage, appOrigin: string): Promise<Admission> {
  if (req.headers.origin !== appOrigin) return { ok: false, status: 403, reason: "cross-origin upgrade refused" };
  const sessionId = readSessionIdFromCookieHeader(req.headers.cookie);
  const documentId = documentIdFromUrl(req.url);
  return decide({ sessionId, documentId });
}

/**
 * The same decision for a connection already open (re-checked periodically): a session that
 * ended, a membership removed or a role lowered, or an archived document take effect without
 * waiting for the client to reconnect.
 */
export async function decide(args: { sessionId: string | null; documentId: string | null }): Promise<Admission> {
  const { current } = await validateSessionId(args.sessionId);
  if (!current) return { ok: false, status: 401, reason: "sign in first" };
  const document = args.documentId ? await getDocument({ documentId: args.documentId }) : null;
  if (!document) return { ok: false, status: 404, reason: "document not found" };
  try {
    const membership = await authorizeWorkspace({ userId: current.user.id, workspaceId: document.workspaceId, action: "document.read" });
    const writable = can(membership.role, "document.edit") && document.archivedAt === null;
    return { ok: true, documentId: document.id, userId: current.user.id, sessionId: current.sessionId, writable };
  } catch (error) {
    if (error instanceof HttpError && (error.status === 401 || error.status === 403 || error.status === 404)) {
      return { ok: false, status: error.status, reason: error.message };
    }
    throw error;
  }
}
