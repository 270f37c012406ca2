import { and, count, eq, gte, lt, min } from "drizzle-orm";
import { getDb } from "./pool";
import { signInAttempts } from "./schema";

export type SignInKeyKind = "account" | "ip";

export async function countFailuresSince(args: {
  keyKind: SignInKeyKind;
  key: string;
  since: Date;
}): Promise<{ failures: number; oldest: Date | null }> {
  const rows = await getDb()
    .select({ failures: count(), oldest: min(signInAttempts.attemptedAt) })
    .from(signInAttempts)
    .where(and(eq(signInAttempts.keyKind, args.keyKind), eq(signInAttempts.key, args.key), gte(signInAttempts.attemptedAt, args.since)));
  return { failures: rows[0]?.failures ?? 0, oldest: rows[0]?.oldest ?? null };
}

export async function recordFailures(args: { keys: { keyKind: SignInKeyKind; key: string }[] }): Promise<void> {
  await getDb().insert(signInAttempts).values(args.keys);
}

export async function clearFailures(args: { keyKind: SignInKeyKind; key: string }): Promise<void> {
  await getDb()
    .delete(signInAttempts)
    .where(and(eq(signInAttempts.keyKind, args.keyKind), eq(signInAttempts.key, args.key)));
}

export async function purgeFailuresBefore(args: { before: Date }): Promise<void> {
  await getDb().delete(signInAttempts).where(lt(signInAttempts.attemptedAt, args.before));
}
