import { and, desc, eq, isNull } from "drizzle-orm";
import type { Role } from "@/lib/schemas/fields";
import { getDb } from "./pool";
import { users, workspaces } from "./schema";
import { apiTokens } from "./schema-api-tokens";

export type ApiTokenListItem = {
  id: string;
  name: string;
  prefix: string;
  role: Role;
  workspaceId: string;
  workspaceName: string;
  createdAt: Date;
  lastUsedAt: Date | null;
  revokedAt: Date | null;
};

export async function insertApiToken(args: { userId: string; workspaceId: string; role: Role; name: string; tokenHash: string; prefix: string }): Promise<{ id: string; createdAt: Date }> {
  const [row] = await getDb().insert(apiTokens).values(args).returning({ id: apiTokens.id, createdAt: apiTokens.createdAt });
  return row;
}

export async function listApiTokensForUser(args: { userId: string }): Promise<ApiTokenListItem[]> {
  const rows = await getDb()
    .select({
      id: apiTokens.id, name: apiTokens.name, prefix: apiTokens.prefix, role: apiTokens.role, workspaceId: apiTokens.workspaceId,
      workspaceName: workspaces.name, createdAt: apiTokens.createdAt, lastUsedAt: apiTokens.lastUsedAt, revokedAt: apiTokens.revokedAt,
    })
    .from(apiTokens)
    .innerJoin(workspaces, eq(workspaces.id, apiTokens.workspaceId))
    .where(eq(apiTokens.userId, args.userId))
    .orderBy(desc(apiTokens.createdAt));
  return rows.map((r) => ({ ...r, role: r.role as Role }));
}

/** Marks the user's token revoked; false when there is no such token of theirs. */
export async function revokeApiToken(args: { userId: string; tokenId: string }): Promise<boolean> {
  const rows = await getDb()
    .update(apiTokens)
    .set({ revokedAt: new Date() })
    .where(and(eq(apiTokens.id, args.tokenId), eq(apiTokens.userId, args.userId), isNull(apiTokens.revokedAt)))
    .returning({ id: apiTokens.id });
  if (rows.length > 0) return true;
  const existing = await getDb().select({ id: apiTokens.id }).from(apiTokens)
    .where(and(eq(apiTokens.id, args.tokenId), eq(apiTokens.userId, args.userId))).limit(1);
  return existing.length > 0;
}

export type TokenLookup = {
  id: string;
  workspaceId: string;
  role: Role;
  revokedAt: Date | null;
  user: { id: string; email: string; name: string };
};

/** The token with this hash and its user, stamping last_used_at when it is live. */
export async function useApiToken(args: { tokenHash: string }): Promise<TokenLookup | null> {
  const [row] = await getDb()
    .select({
      id: apiTokens.id, workspaceId: apiTokens.workspaceId, role: apiTokens.role, revokedAt: apiTokens.revokedAt,
      userId: users.id, email: users.email, name: users.name,
    })
    .from(apiTokens)
    .innerJoin(users, eq(users.id, apiTokens.userId))
    .where(eq(apiTokens.tokenHash, args.tokenHash))
    .limit(1);
  if (!row) return null;
  if (!row.revokedAt) await getDb().update(apiTokens).set({ lastUsedAt: new Date() }).where(eq(apiTokens.id, row.id));
  return {
    id: row.id, workspaceId: row.workspaceId, role: row.role as Role, revokedAt: row.revokedAt,
    user: { id: row.userId, email: row.email, name: row.name },
  };
}
