// Named versions, comment threads, review rounds and notification settings (DESIGN §6).
// A version is immutable once written: the Yjs state, the compiled Scenario and the Result
// summary, so lists and diffs never re-run the engine.
import { boolean, check, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { sql } from "drizzle-orm";
import type { ResultSummary } from "@/lib/versions/types";
import { users } from "./schema";
import { bytea, documents } from "./schema-documents";

const at = (name: string) => timestamp(name, { withTimezone: true, mode: "date" });

export const versions = pgTable(
  "versions",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    documentId: uuid("document_id")
      .notNull()
      .references(() => documents.id, { onDelete: "cascade" }),
    /** 1, 2, 3 … per document, in saving order */
    number: integer("number").notNull(),
    name: text("name").notNull(),
    message: text("message").notNull().default(""),
    authorId: uuid("author_id").references(() => users.id, { onDelete: "set null" }),
    createdAt: at("created_at").notNull().defaultNow(),
    yjsState: bytea("yjs_state").notNull(),
    /** null when the document did not compile at saving time */
    scenario: jsonb("scenario").$type<Record<string, unknown>>(),
    resultSummary: jsonb("result_summary").$type<ResultSummary>(),
    /** why there is no scenario or result (compile or engine messages) */
    problems: jsonb("problems").$type<string[]>().notNull().default([]),
  },
  (t) => [uniqueIndex("versions_document_number_unique").on(t.documentId, t.number), check("versions_number_positive", sql`${t.number} > 0`)],
);

export const anchorKindEnum = pgEnum("comment_anchor_kind", ["block", "parameter", "ledger_row"]);

export const commentThreads = pgTable(
  "comment_threads",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    documentId: uuid("document_id")
      .notNull()
      .references(() => documents.id, { onDelete: "cascade" }),
    /** the version the thread was opened on */
    versionId: uuid("version_id")
      .notNull()
      .references(() => versions.id, { onDelete: "cascade" }),
    anchorKind: anchorKindEnum("anchor_kind").notNull(),
    /** block id | "blockId/field" | ledger key */
    anchorKey: text("anchor_key").notNull(),
    /** what the anchor was called when the thread was opened, so a detached thread still says what it was about */
    anchorLabel: text("anchor_label").notNull(),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: at("created_at").notNull().defaultNow(),
    resolvedAt: at("resolved_at"),
    resolvedBy: uuid("resolved_by").references(() => users.id, { onDelete: "set null" }),
  },
  (t) => [index("comment_threads_document_idx").on(t.documentId, t.createdAt)],
);

export const comments = pgTable(
  "comments",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    threadId: uuid("thread_id")
      .notNull()
      .references(() => commentThreads.id, { onDelete: "cascade" }),
    authorId: uuid("author_id").references(() => users.id, { onDelete: "set null" }),
    /** light formatting (lib/versions/markup.ts); stored as written, rendered escaped */
    body: text("body").notNull(),
    createdAt: at("created_at").notNull().defaultNow(),
    /** user ids of the members the body mentions (resolved when written) */
    mentions: jsonb("mentions").$type<string[]>().notNull().default([]),
  },
  (t) => [index("comments_thread_idx").on(t.threadId, t.createdAt)],
);

export const reviewStateEnum = pgEnum("review_state", ["open", "approved", "changes_requested"]);
export const reviewVerdictEnum = pgEnum("review_verdict", ["approve", "changes_requested"]);

export const reviewRounds = pgTable(
  "review_rounds",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    documentId: uuid("document_id")
      .notNull()
      .references(() => documents.id, { onDelete: "cascade" }),
    versionId: uuid("version_id")
      .notNull()
      .references(() => versions.id, { onDelete: "cascade" }),
    requestedBy: uuid("requested_by").references(() => users.id, { onDelete: "set null" }),
    message: text("message").notNull().default(""),
    state: reviewStateEnum("state").notNull().default("open"),
    createdAt: at("created_at").notNull().defaultNow(),
  },
  (t) => [index("review_rounds_document_idx").on(t.documentId, t.createdAt)],
);

export const reviewRequests = pgTable(
  "review_requests",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    roundId: uuid("round_id")
      .notNull()
      .references(() => reviewRounds.id, { onDelete: "cascade" }),
    reviewerId: uuid("reviewer_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    verdict: reviewVerdictEnum("verdict"),
    comment: text("comment").notNull().default(""),
    decidedAt: at("decided_at"),
  },
  (t) => [uniqueIndex("review_requests_round_reviewer_unique").on(t.roundId, t.reviewerId), index("review_requests_reviewer_idx").on(t.reviewerId)],
);

/** E-mail on/off per kind; a missing row means every kind is on. */
export const notificationSettings = pgTable("notification_settings", {
  userId: uuid("user_id")
    .primaryKey()
    .references(() => users.id, { onDelete: "cascade" }),
  reviewRequests: boolean("review_requests").notNull().default(true),
  mentions: boolean("mentions").notNull().default(true),
  verdicts: boolean("verdicts").notNull().default(true),
  updatedAt: at("updated_at").notNull().defaultNow(),
});
