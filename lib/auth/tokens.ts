// Single-use tokens for e-mailed links: 32 random bytes (256 bits) in base64url. Only the
// SHA-256 is stored; with that much entropy a fast hash is enough (no salt or KDF needed).
import { createHash, randomBytes } from "node:crypto";

export function hashToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashToken(token) };
}

export function appUrl(path: string): string {
  const base = (process.env.APP_URL ?? "http://127.0.0.1:3210").replace(/\/+$/, "");
  return `${base}${path}`;
}
