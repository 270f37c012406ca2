// Scenario documents and their Yjs state. The state of a document is its snapshot row (one
// merged Yjs update) plus every update row still present; the collaboration server appends
// one row per accepted edit and compacts them into the snapshot (db/document-updates.ts).
import { sql } from "drizzle-orm";
import { bigint, bigserial, customType, index, jsonb, pgEnum, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { users, workspaces } from "./schema";

/** Binary column: Uint8Array in TypeScript, bytea in PostgreSQL (drizzle has no built-in one). */
export const bytea = customType<{ data: Uint8Array; driverData: Buffer }>({
  dataType: () => "bytea",
  toDriver: (value) => Buffer.from(value.buffer, value.byteOffset, value.byteLength),
  fromDriver: (value) => new Uint8Array(value.buffer, value.byteOffset, value.byteLength),
});

const at = (name: string) => timestamp(name, { withTimezone: true, mode: "date" });

// Same list as POWERTRAINS in lib/notebook/block-kinds.ts (db/documents.ts checks they agree).
export const powertrainEnum = pgEnum("powertrain", ["conventional", "bev", "parallel", "series"]);

/** Headline figures shown in the documents table; written by the UI after a recalculation. */
export type DocumentSummary = {
  kpi: Partial<Record<string, number | boolean | null>>;
  computedAt?: string;
};

export const documents = pgTable(
  "documents",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspaces.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    powertrain: powertrainEnum("powertrain").notNull(),
    createdBy: uuid("created_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: at("created_at").notNull().defaultNow(),
    updatedAt: at("updated_at").notNull().defaultNow(),
    archivedAt: at("archived_at"),
    summary: jsonb("summary").$type<DocumentSummary>(),
  },
  (t) => [index("documents_workspace_idx").on(t.workspaceId, t.updatedAt)],
);

// seq orders the rows of one document; the id is a global sequence, which is enough for that.
export const documentUpdates = pgTable(
  "document_updates",
  {
    seq: bigserial("seq", { mode: "number" }).primaryKey(),
    documentId: uuid("document_id")
      .notNull()
      .references(() => documents.id, { onDelete: "cascade" }),
    update: bytea("update").notNull(),
    createdAt: at("created_at").notNull().default(sql`now()`),
  },
  (t) => [index("document_updates_document_idx").on(t.documentId, t.seq)],
);

export const documentSnapshots = pgTable("document_snapshots", {
  documentId: uuid("document_id")
    .primaryKey()
    .references(() => documents.id, { onDelete: "cascade" }),
  state: bytea("state").notNull(),
  /** Highest update seq merged into this snapshot (informational: merged rows are deleted). */
  uptoSeq: bigint("upto_seq", { mode: "number" }).notNull().default(0),
  updatedAt: at("updated_at").notNull().defaultNow(),
});
