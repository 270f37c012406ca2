// Queries on the documents table (metadata only; the Yjs state is in db/document-updates.ts).
import { and, asc, desc, eq, getTableColumns, ilike, isNotNull, isNull, sql, type SQL } from "drizzle-orm";
import type { PowertrainKind } from "@/lib/notebook/block-kinds";
import { getDb, type Tx } from "./pool";
import { documents, powertrainEnum, users, type DocumentSummary } from "./schema";

// The enum in the schema and the notebook's list must name the same powertrains.
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : never) : never;
const powertrainsAgree: Same<(typeof powertrainEnum.enumValues)[number], PowertrainKind> = true;
void powertrainsAgree;

export type DocumentRow = typeof documents.$inferSelect;
export type DocumentSort = "name" | "updated" | "powertrain" | "kpi";
/** A document row with its creator's display name (null when the account is gone). */
export type DocumentListRow = DocumentRow & { createdByName: string | null };

export async function insertDocument(args: {
  workspaceId: string;
  name: string;
  powertrain: PowertrainKind;
  createdBy: string | null;
  summary?: DocumentSummary | null;
  tx?: Tx;
}): Promise<DocumentRow> {
  const [row] = await (args.tx ?? getDb())
    .insert(documents)
    .values({ workspaceId: args.workspaceId, name: args.name, powertrain: args.powertrain, createdBy: args.createdBy, summary: args.summary ?? null })
    .returning();
  return row!;
}

export async function getDocument(args: { documentId: string; tx?: Tx }): Promise<DocumentRow | null> {
  const rows = await (args.tx ?? getDb()).select().from(documents).where(eq(documents.id, args.documentId)).limit(1);
  return rows[0] ?? null;
}

/** A document of the workspace, or null (also when it belongs to another workspace). */
export async function getWorkspaceDocument(args: { workspaceId: string; documentId: string }): Promise<DocumentListRow | null> {
  const rows = await getDb()
    .select({ ...getTableColumns(documents), createdByName: users.name })
    .from(documents)
    .leftJoin(users, eq(users.id, documents.createdBy))
    .where(and(eq(documents.id, args.documentId), eq(documents.workspaceId, args.workspaceId)))
    .limit(1);
  return rows[0] ?? null;
}

function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}

function orderFor(sort: DocumentSort, kpiKey: string, direction: "asc" | "desc"): SQL[] {
  const dir = direction === "asc" ? asc : desc;
  switch (sort) {
    case "name":
      return [dir(sql`lower(${documents.name})`), asc(documents.id)];
    case "powertrain":
      return [dir(documents.powertrain), asc(sql`lower(${documents.name})`), asc(documents.id)];
    case "kpi": {
      // Documents without that figure go last in both directions.
      const value = sql`(${documents.summary} -> 'kpi' ->> ${kpiKey})::double precision`;
      return [sql`${value} ${sql.raw(direction)} nulls last`, asc(sql`lower(${documents.name})`), asc(documents.id)];
    }
    default:
      return [dir(documents.updatedAt), asc(documents.id)];
  }
}

export async function listDocuments(args: {
  workspaceId: string;
  query?: string;
  archived: boolean;
  sort: DocumentSort;
  direction: "asc" | "desc";
  kpiKey: string;
}): Promise<DocumentListRow[]> {
  const where = [
    eq(documents.workspaceId, args.workspaceId),
    args.archived ? isNotNull(documents.archivedAt) : isNull(documents.archivedAt),
  ];
  if (args.query) where.push(ilike(documents.name, `%${escapeLike(args.query)}%`));
  return getDb()
    .select({ ...getTableColumns(documents), createdByName: users.name })
    .from(documents)
    .leftJoin(users, eq(users.id, documents.createdBy))
    .where(and(...where))
    .orderBy(...orderFor(args.sort, args.kpiKey, args.direction))
    .limit(1000);
}

export async function renameDocument(args: { documentId: string; name: string }): Promise<DocumentRow | null> {
  const [row] = await getDb()
    .update(documents)
    .set({ name: args.name, updatedAt: sql`now()` })
    .where(eq(documents.id, args.documentId))
    .returning();
  return row ?? null;
}

export async function setDocumentArchived(args: { documentId: string; archived: boolean }): Promise<DocumentRow | null> {
  const [row] = await getDb()
    .update(documents)
    // Keep the first archiving time when archived twice.
    .set({ archivedAt: args.archived ? sql`coalesce(${documents.archivedAt}, now())` : null })
    .where(eq(documents.id, args.documentId))
    .returning();
  return row ?? null;
}

export async function setDocumentSummary(args: { documentId: string; summary: DocumentSummary }): Promise<DocumentRow | null> {
  const [row] = await getDb().update(documents).set({ summary: args.summary }).where(eq(documents.id, args.documentId)).returning();
  return row ?? null;
}

/** Marks the document as edited now (the collaboration server calls it, throttled). */
export async function touchDocument(args: { documentId: string }): Promise<void> {
  await getDb().update(documents).set({ updatedAt: sql`now()` }).where(eq(documents.id, args.documentId));
}
