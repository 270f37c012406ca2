// Sign-in throttling with its state in PostgreSQL (so it holds across processes and restarts).
// Limits are common practice, no source: 5 failures per account and 20 per client address
// within 15 minutes; the next attempt is refused with 429 until the oldest failure ages out.
import { clearFailures, countFailuresSince, purgeFailuresBefore, recordFailures, type SignInKeyKind } from "@/db/sign-in-attempts";
import { TooManyRequests } from "@/lib/http/errors";

export const THROTTLE_WINDOW_MS = 15 * 60 * 1000;
export const ACCOUNT_FAILURE_LIMIT = 5;
export const IP_FAILURE_LIMIT = 20;

async function retryAfterS(keyKind: SignInKeyKind, key: string, limit: number, now: Date): Promise<number | null> {
  const since = new Date(now.getTime() - THROTTLE_WINDOW_MS);
  const { failures, oldest } = await countFailuresSince({ keyKind, key, since });
  if (failures < limit || !oldest) return null;
  return (oldest.getTime() + THROTTLE_WINDOW_MS - now.getTime()) / 1000;
}

/** Throws TooManyRequests (429 with Retry-After) when the account or the address is locked out. */
export async function assertSignInAllowed(args: { email: string; ip: string }): Promise<void> {
  const now = new Date();
  const account = await retryAfterS("account", args.email, ACCOUNT_FAILURE_LIMIT, now);
  if (account !== null) throw new TooManyRequests(account, "too many failed sign-ins for this account; try again later");
  const ip = await retryAfterS("ip", args.ip, IP_FAILURE_LIMIT, now);
  if (ip !== null) throw new TooManyRequests(ip, "too many failed sign-ins from your network; try again later");
}

export async function recordSignInFailure(args: { email: string; ip: string }): Promise<void> {
  await recordFailures({ keys: [{ keyKind: "account", key: args.email }, { keyKind: "ip", key: args.ip }] });
  // Housekeeping: rows older than a day no longer count for anything.
  await purgeFailuresBefore({ before: new Date(Date.now() - 24 * 3600 * 1000) });
}

/** A successful sign-in forgives the account's failures (not the address's). */
export async function recordSignInSuccess(args: { email: string }): Promise<void> {
  await clearFailures({ keyKind: "account", key: args.email });
}
