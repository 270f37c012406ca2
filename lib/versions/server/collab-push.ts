// Hands an update already stored in PostgreSQL to the collaboration server, so clients connected
// right now receive it (server/collab/inject.ts). Best effort: when the server is not running
// or not reachable, the update still reaches everyone on their next load.
import { injectSecret } from "./inject-secret";

function collabHttpBase(): string | null {
  const explicit = process.env.COLLAB_INTERNAL_URL;
  if (explicit) return explicit.replace(/\/+$/, "");
  const ws = process.env.COLLAB_URL;
  if (!ws) return null;
  try {
    const url = new URL(ws);
    url.protocol = url.protocol === "wss:" ? "https:" : "http:";
    return url.origin;
  } catch {
    return null;
  }
}

export async function pushUpdateToCollab(args: { documentId: string; update: Uint8Array }): Promise<boolean> {
  const base = collabHttpBase();
  if (!base) return false;
  try {
    const res = await fetch(`${base}/internal/documents/${encodeURIComponent(args.documentId)}/update`, {
      method: "POST",
      headers: { authorization: `Bearer ${injectSecret()}`, "content-type": "application/octet-stream" },
      body: Buffer.from(args.update),
      signal: AbortSignal.timeout(5000),
    });
    if (!res.ok) return false;
    const body = (await res.json()) as { applied?: boolean };
    return body.applied === true;
  } catch (error) {
    console.error(`[joulebook] could not hand the restore of ${args.documentId} to the collaboration server:`, error);
    return false;
  }
}
