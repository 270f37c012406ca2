// Personal API tokens for scripted access (issue 7). Re-exported from db/schema.ts.
// Only the SHA-256 of a token is stored; the token itself is shown once at creation.
import { sql } from "drizzle-orm";
import { check, index, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { users, workspaces } from "./schema";

export const apiTokens = pgTable(
  "api_tokens",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    userId: uuid("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    workspaceId: uuid("workspace_id").notNull().references(() => workspaces.id, { onDelete: "cascade" }),
    // A role no higher than the creator's at creation; at use it is capped again by the
    // creator's current role. Plain text (checked) rather than the workspace_role enum so
    // that this file does not depend on schema.ts's evaluation order.
    role: text("role").notNull(),
    name: text("name").notNull(),
    tokenHash: text("token_hash").notNull(),
    /** The first characters of the token, to recognise it in lists ("jb_a1b2c3…"). */
    prefix: text("prefix").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
    lastUsedAt: timestamp("last_used_at", { withTimezone: true, mode: "date" }),
    revokedAt: timestamp("revoked_at", { withTimezone: true, mode: "date" }),
  },
  (t) => [
    uniqueIndex("api_tokens_hash_unique").on(t.tokenHash),
    index("api_tokens_user_idx").on(t.userId),
    check("api_tokens_role_known", sql`${t.role} in ('owner', 'editor', 'reviewer', 'viewer')`),
  ],
);
