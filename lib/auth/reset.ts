// Password reset by an e-mailed single-use link: 1 h expiry, only the SHA-256 stored,
// using it ends every session of the user.
import { getDb } from "@/db/pool";
import { consumePasswordResetToken, countResetTokensSince, expireUserPasswordResetTokens, getPasswordResetToken, insertPasswordResetToken } from "@/db/password-resets";
import { getUserByEmail, getUserById, updateUserPasswordHash } from "@/db/users";
import { Gone, Unprocessable } from "@/lib/http/errors";
import { trySendMail } from "@/lib/mail/send";
import { passwordResetMail } from "@/lib/mail/templates";
import { passwordProblem } from "@/lib/schemas/fields";
import { hashPassword } from "./password";
import { endAllSessionsOfUser } from "./session";
import { appUrl, hashToken, newToken } from "./tokens";

export const RESET_TOKEN_TTL_MS = 60 * 60 * 1000;
// Common practice, no source: a few links per quarter hour is plenty for a person and stops
// anyone from flooding someone's mailbox through this form.
export const RESET_MAILS_PER_15_MIN = 3;
const UNUSABLE = "this reset link has expired or was already used; ask for a new one";

/** Mails a link when the account exists; says nothing either way (no account discovery). */
export async function requestPasswordReset(args: { email: string }): Promise<void> {
  const user = await getUserByEmail({ email: args.email });
  if (!user) return;
  const since = new Date(Date.now() - 15 * 60 * 1000);
  if ((await countResetTokensSince({ userId: user.id, since })) >= RESET_MAILS_PER_15_MIN) return;
  const { token, hash } = newToken();
  await insertPasswordResetToken({ tokenHash: hash, userId: user.id, expiresAt: new Date(Date.now() + RESET_TOKEN_TTL_MS) });
  const link = appUrl(`/reset-password?token=${encodeURIComponent(token)}`);
  await trySendMail({ to: user.email, ...passwordResetMail({ name: user.name, link }) });
}

export async function confirmPasswordReset(args: { token: string; password: string }): Promise<void> {
  const tokenHash = hashToken(args.token);
  const row = await getPasswordResetToken({ tokenHash });
  if (!row || row.usedAt || row.expiresAt.getTime() <= Date.now()) throw new Gone(UNUSABLE);
  const user = await getUserById({ id: row.userId });
  if (!user) throw new Gone(UNUSABLE);
  const problem = passwordProblem(args.password, user.email);
  if (problem) throw new Unprocessable({ password: problem });
  const passwordHash = await hashPassword(args.password);
  await getDb().transaction(async (tx) => {
    // Consumed atomically: of two concurrent uses of one link only one gets here.
    const userId = await consumePasswordResetToken({ tokenHash, tx });
    if (!userId) throw new Gone(UNUSABLE);
    await updateUserPasswordHash({ id: userId, passwordHash, tx });
    await expireUserPasswordResetTokens({ userId, tx });
  });
  await endAllSessionsOfUser(user.id);
}
