// Personal API tokens: "jb_" + 32 random bytes in base64url (256 bits). Only the SHA-256 is
// stored; with that much entropy a fast hash is enough (no salt or KDF needed).
import { createHash, randomBytes } from "node:crypto";

export const TOKEN_PREFIX = "jb_";
const TOKEN_SHAPE = /^jb_[A-Za-z0-9_-]{43}$/;

export function hashApiToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

export function newApiToken(): { token: string; hash: string; prefix: string } {
  const token = TOKEN_PREFIX + randomBytes(32).toString("base64url");
  return { token, hash: hashApiToken(token), prefix: token.slice(0, 9) };
}

export function looksLikeApiToken(value: string): boolean {
  return TOKEN_SHAPE.test(value);
}

/** The token of an `Authorization: Bearer jb_…` header; null when the header is absent or another scheme. */
export function bearerToken(header: string | null): string | null {
  if (!header) return null;
  const m = header.match(/^Bearer\s+(\S+)\s*$/i);
  return m ? m[1] : null;
}
