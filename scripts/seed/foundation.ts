// Seed step: the demo team and its workspace. Idempotent: existing rows are left as they are.
import { and, eq } from "drizzle-orm";
import { getDb } from "../../db/pool";
import { memberships, users, workspaces } from "../../db/schema";
import { hashPassword } from "../../lib/auth/password";
import type { Role } from "../../lib/schemas/fields";
import type { SeedContext } from "./types";

// A fictional concept team; example.com addresses are reserved for examples (RFC 2606).
export const DEMO_PASSWORD = "joulebook-demo-2026";
export const DEMO_WORKSPACE_NAME = "Urban Van Concept";
export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: "ada@example.com", name: "Ada Okonkwo", role: "owner" },
  { email: "ben@example.com", name: "Ben Halvorsen", role: "editor" },
  { email: "chloe@example.com", name: "Chloé Marchetti", role: "reviewer" },
  { email: "dev@example.com", name: "Dev Raghunathan", role: "viewer" },
];

async function ensureUser(u: { email: string; name: string }, passwordHash: string): Promise<string> {
  const db = getDb();
  await db.insert(users).values({ email: u.email, name: u.name, passwordHash }).onConflictDoNothing({ target: users.email });
  const [row] = await db.select({ id: users.id }).from(users).where(eq(users.email, u.email));
  if (!row) throw new Error(`seed: user ${u.email} missing after insert`);
  return row.id;
}

/** The demo workspace is the one named DEMO_WORKSPACE_NAME that the demo owner owns. */
async function ensureWorkspace(ownerId: string): Promise<string> {
  const db = getDb();
  const found = await db
    .select({ id: workspaces.id })
    .from(workspaces)
    .innerJoin(memberships, eq(memberships.workspaceId, workspaces.id))
    .where(and(eq(workspaces.name, DEMO_WORKSPACE_NAME), eq(memberships.userId, ownerId), eq(memberships.role, "owner")))
    .limit(1);
  if (found[0]) return found[0].id;
  const [ws] = await db.insert(workspaces).values({ name: DEMO_WORKSPACE_NAME }).returning({ id: workspaces.id });
  if (!ws) throw new Error("seed: workspace insert returned nothing");
  return ws.id;
}

export async function seedFoundation(ctx: SeedContext): Promise<void> {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const ids = new Map<string, string>();
  for (const u of DEMO_USERS) ids.set(u.email, await ensureUser(u, passwordHash));
  const ownerId = ids.get(DEMO_USERS[0]!.email)!;
  const workspaceId = await ensureWorkspace(ownerId);
  for (const u of DEMO_USERS)
    await getDb().insert(memberships).values({ workspaceId, userId: ids.get(u.email)!, role: u.role }).onConflictDoNothing();
  ctx.demoWorkspaceId = workspaceId;
  ctx.userIds = ids;
}
