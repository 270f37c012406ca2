import { eq } from "drizzle-orm";
import { getDb, type Tx } from "./pool";
import { users } from "./schema";

export type UserRow = typeof users.$inferSelect;
export type PublicUser = { id: string; email: string; name: string };

export function toPublicUser(u: Pick<UserRow, "id" | "email" | "name">): PublicUser {
  return { id: u.id, email: u.email, name: u.name };
}

export async function getUserByEmail(args: { email: string; tx?: Tx }): Promise<UserRow | null> {
  const rows = await (args.tx ?? getDb()).select().from(users).where(eq(users.email, args.email)).limit(1);
  return rows[0] ?? null;
}

export async function getUserById(args: { id: string; tx?: Tx }): Promise<UserRow | null> {
  const rows = await (args.tx ?? getDb()).select().from(users).where(eq(users.id, args.id)).limit(1);
  return rows[0] ?? null;
}

/** Returns null when the e-mail is taken (unique index), instead of throwing a database error. */
export async function insertUser(args: { email: string; name: string; passwordHash: string; tx?: Tx }): Promise<UserRow | null> {
  const rows = await (args.tx ?? getDb())
    .insert(users)
    .values({ email: args.email, name: args.name, passwordHash: args.passwordHash })
    .onConflictDoNothing({ target: users.email })
    .returning();
  return rows[0] ?? null;
}

export async function updateUserName(args: { id: string; name: string }): Promise<UserRow | null> {
  const rows = await getDb().update(users).set({ name: args.name }).where(eq(users.id, args.id)).returning();
  return rows[0] ?? null;
}

export async function updateUserPasswordHash(args: { id: string; passwordHash: string; tx?: Tx }): Promise<void> {
  await (args.tx ?? getDb()).update(users).set({ passwordHash: args.passwordHash }).where(eq(users.id, args.id));
}
