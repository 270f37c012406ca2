// Account flows: sign-up, sign-in (throttled), password change. Password reset: reset.ts.
import { getUserByEmail, getUserById, insertUser, toPublicUser, updateUserName, updateUserPasswordHash, type PublicUser } from "@/db/users";
import { Conflict, NotFound, Unauthorized, Unprocessable } from "@/lib/http/errors";
import { passwordProblem } from "@/lib/schemas/fields";
import { hashPassword, verifyAgainstDummy, verifyPassword } from "./password";
import { endAllSessionsOfUser, startSession, type SessionCookie } from "./session";
import { assertSignInAllowed, recordSignInFailure, recordSignInSuccess } from "./throttle";

export async function signUp(args: { email: string; name: string; password: string }): Promise<{ user: PublicUser; cookie: SessionCookie }> {
  const problem = passwordProblem(args.password, args.email);
  if (problem) throw new Unprocessable({ password: problem });
  const taken = "an account with this e-mail address already exists; sign in instead";
  if (await getUserByEmail({ email: args.email })) throw new Conflict(taken);
  const row = await insertUser({ email: args.email, name: args.name, passwordHash: await hashPassword(args.password) });
  if (!row) throw new Conflict(taken); // lost a race with a concurrent sign-up
  return { user: toPublicUser(row), cookie: await startSession(row.id) };
}

export async function signIn(args: { email: string; password: string; ip: string }): Promise<{ user: PublicUser; cookie: SessionCookie }> {
  await assertSignInAllowed({ email: args.email, ip: args.ip });
  const row = await getUserByEmail({ email: args.email });
  const ok = row ? await verifyPassword(row.passwordHash, args.password) : await verifyAgainstDummy(args.password);
  if (!row || !ok) {
    await recordSignInFailure({ email: args.email, ip: args.ip });
    throw new Unauthorized("the e-mail address or the password is wrong");
  }
  await recordSignInSuccess({ email: args.email });
  return { user: toPublicUser(row), cookie: await startSession(row.id) };
}

export async function renameUser(args: { userId: string; name: string }): Promise<PublicUser> {
  const row = await updateUserName({ id: args.userId, name: args.name });
  if (!row) throw new NotFound("account not found");
  return toPublicUser(row);
}

/** Changes the password, signs out every session of the user and returns a fresh one for this browser. */
export async function changePassword(args: { userId: string; currentPassword: string; newPassword: string }): Promise<SessionCookie> {
  const row = await getUserById({ id: args.userId });
  if (!row) throw new NotFound("account not found");
  if (!(await verifyPassword(row.passwordHash, args.currentPassword)))
    throw new Unprocessable({ currentPassword: "the current password is wrong" });
  const problem = passwordProblem(args.newPassword, row.email);
  if (problem) throw new Unprocessable({ newPassword: problem });
  await updateUserPasswordHash({ id: row.id, passwordHash: await hashPassword(args.newPassword) });
  await endAllSessionsOfUser(row.id);
  return startSession(row.id);
}
