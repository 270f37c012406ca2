import { and, count, eq, gt, gte, isNull } from "drizzle-orm";
import { getDb, type Tx } from "./pool";
import { passwordResetTokens } from "./schema";

export type PasswordResetRow = typeof passwordResetTokens.$inferSelect;

export async function insertPasswordResetToken(args: { tokenHash: string; userId: string; expiresAt: Date }): Promise<void> {
  await getDb().insert(passwordResetTokens).values(args);
}

export async function getPasswordResetToken(args: { tokenHash: string }): Promise<PasswordResetRow | null> {
  const rows = await getDb().select().from(passwordResetTokens).where(eq(passwordResetTokens.tokenHash, args.tokenHash)).limit(1);
  return rows[0] ?? null;
}

/** Marks the token used if it is still unused and unexpired; returns its user, or null. Atomic. */
export async function consumePasswordResetToken(args: { tokenHash: string; tx: Tx }): Promise<string | null> {
  const now = new Date();
  const rows = await args.tx
    .update(passwordResetTokens)
    .set({ usedAt: now })
    .where(and(eq(passwordResetTokens.tokenHash, args.tokenHash), isNull(passwordResetTokens.usedAt), gt(passwordResetTokens.expiresAt, now)))
    .returning({ userId: passwordResetTokens.userId });
  return rows[0]?.userId ?? null;
}

/** After a reset every other outstanding link of the user stops working. */
export async function expireUserPasswordResetTokens(args: { userId: string; tx: Tx }): Promise<void> {
  await args.tx
    .update(passwordResetTokens)
    .set({ usedAt: new Date() })
    .where(and(eq(passwordResetTokens.userId, args.userId), isNull(passwordResetTokens.usedAt)));
}

export async function countResetTokensSince(args: { userId: string; since: Date }): Promise<number> {
  const rows = await getDb()
    .select({ n: count() })
    .from(passwordResetTokens)
    .where(and(eq(passwordResetTokens.userId, args.userId), gte(passwordResetTokens.createdAt, args.since)));
  return rows[0]?.n ?? 0;
}
