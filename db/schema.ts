// Drizzle schema: every table of the product. Migrations in drizzle/ are generated from it
// (`npx drizzle-kit generate --name <what>`); never hand-edit the SQL.
// Later features (documents, versions, comments, reviews) add their tables below.
import { sql } from "drizzle-orm";
import { check, index, pgEnum, pgTable, primaryKey, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";

const createdAt = () => timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow();

export const roleEnum = pgEnum("workspace_role", ["owner", "editor", "reviewer", "viewer"]);
export const signInKeyKindEnum = pgEnum("sign_in_key_kind", ["account", "ip"]);

export const users = pgTable(
  "users",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    // Always stored lower-cased and trimmed (the zod schemas normalise it); the check keeps it so.
    email: text("email").notNull(),
    name: text("name").notNull(),
    passwordHash: text("password_hash").notNull(),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("users_email_unique").on(t.email), check("users_email_lower", sql`${t.email} = lower(${t.email})`)],
);

// Lucia sessions; the id is lucia's random session id, never guessable.
export const sessions = pgTable(
  "sessions",
  {
    id: text("id").primaryKey(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    expiresAt: timestamp("expires_at", { withTimezone: true, mode: "date" }).notNull(),
  },
  (t) => [index("sessions_user_idx").on(t.userId)],
);

export const workspaces = pgTable("workspaces", {
  id: uuid("id").primaryKey().defaultRandom(),
  name: text("name").notNull(),
  createdAt: createdAt(),
});

export const memberships = pgTable(
  "memberships",
  {
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: roleEnum("role").notNull(),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.workspaceId, t.userId] }), index("memberships_user_idx").on(t.userId)],
);

// Only the SHA-256 of the token is stored: a leaked table does not let anyone accept.
export const invitations = pgTable(
  "invitations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    role: roleEnum("role").notNull(),
    tokenHash: text("token_hash").notNull(),
    invitedBy: uuid("invited_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    expiresAt: timestamp("expires_at", { withTimezone: true, mode: "date" }).notNull(),
    usedAt: timestamp("used_at", { withTimezone: true, mode: "date" }),
  },
  (t) => [uniqueIndex("invitations_token_hash_unique").on(t.tokenHash), index("invitations_workspace_idx").on(t.workspaceId)],
);

export const passwordResetTokens = pgTable(
  "password_reset_tokens",
  {
    tokenHash: text("token_hash").primaryKey(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    createdAt: createdAt(),
    expiresAt: timestamp("expires_at", { withTimezone: true, mode: "date" }).notNull(),
    usedAt: timestamp("used_at", { withTimezone: true, mode: "date" }),
  },
  (t) => [index("password_reset_tokens_user_idx").on(t.userId)],
);

// One row per failed sign-in, twice: keyed by account (e-mail) and by client address.
export const signInAttempts = pgTable(
  "sign_in_attempts",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    keyKind: signInKeyKindEnum("key_kind").notNull(),
    key: text("key").notNull(),
    attemptedAt: timestamp("attempted_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [index("sign_in_attempts_key_idx").on(t.keyKind, t.key, t.attemptedAt)],
);

// Mail received by the local fake SMTP server (server/mail-sink.ts).
export const outboxMessages = pgTable(
  "outbox_messages",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    to: text("to").notNull(),
    from: text("from").notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    html: text("html"),
    raw: text("raw").notNull(),
    receivedAt: timestamp("received_at", { withTimezone: true, mode: "date" }).notNull().default(sql`now()`),
  },
  (t) => [index("outbox_messages_received_idx").on(t.receivedAt)],
);
export * from "./schema-api-tokens";
export * from "./schema-documents";
export * from "./schema-versions";
export * from "./schema-library";
