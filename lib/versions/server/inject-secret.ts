// The shared secret of the collaboration server's loopback update endpoint (server/collab/inject.ts).
import { createHash } from "node:crypto";

/**
 * COLLAB_INJECT_SECRET, or one derived from DATABASE_URL: both processes have it, and whoever
 * knows it can write the documents directly anyway, so the derived secret grants nothing more.
 */
export function injectSecret(): string {
  const explicit = process.env.COLLAB_INJECT_SECRET;
  if (explicit) return explicit;
  return createHash("sha256").update(`joulebook collab inject\u0000${process.env.DATABASE_URL ?? ""}`).digest("hex");
}
