// The team library (issue 7): drive cycles and component tables saved once per workspace and
// referenced by id from document blocks. Re-exported from db/schema.ts.
//
// Usage ("used by 3 documents") is not stored: it is computed from the documents' current
// content (drive-cycle blocks whose source is the library), so it can never go stale when a
// block is edited, and deleting an item in use is refused with the list of those documents.
import { index, jsonb, pgEnum, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { users, workspaces } from "./schema";

export const libraryItemKindEnum = pgEnum("library_item_kind", ["cycle", "engine_full_load", "battery_ocv"]);

export const libraryItems = pgTable(
  "library_items",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    workspaceId: uuid("workspace_id").notNull().references(() => workspaces.id, { onDelete: "cascade" }),
    kind: libraryItemKindEnum("kind").notNull(),
    name: text("name").notNull(),
    /** Where the data comes from, in the uploader's words ("GTR 15 Annex 1, our copy", "bench test 2026-10"). */
    sourceNote: text("source_note").notNull().default(""),
    /** The validated data: cycle {dt_s, speed_kmh, grade_pct?}, full load {speed_rpm, torque_nm}, OCV {soc, voltage_v}. */
    data: jsonb("data").notNull(),
    /** Figures for lists without loading the data: statistics, recognition label, file name. */
    summary: jsonb("summary").notNull(),
    uploadedBy: uuid("uploaded_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [index("library_items_workspace_idx").on(t.workspaceId, t.createdAt)],
);
