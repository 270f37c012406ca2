// Queries on named versions. A version row is written once and never updated.
import { and, desc, eq, sql } from "drizzle-orm";
import type { Kpi } from "@/lib/engine";
import type { ResultSummary } from "@/lib/versions/types";
import { getDb, type Tx } from "./pool";
import { users, versions } from "./schema";

export type VersionRow = typeof versions.$inferSelect;

/** What the version list shows: no Yjs state, no traces. */
export interface VersionListItem {
  id: string;
  number: number;
  name: string;
  message: string;
  authorId: string | null;
  authorName: string | null;
  createdAt: Date;
  kpi: Kpi | null;
  problems: string[];
}

/**
 * Inserts a version with the next number of its document. A transaction-level advisory lock on
 * the document serialises concurrent saves, so numbers stay 1, 2, 3 … without gaps or clashes.
 */
export async function insertVersion(args: {
  documentId: string;
  name: string;
  message: string;
  authorId: string;
  yjsState: Uint8Array;
  scenario: Record<string, unknown> | null;
  resultSummary: ResultSummary | null;
  problems: string[];
}): Promise<VersionRow> {
  return getDb().transaction(async (tx) => {
    await tx.execute(sql`select pg_advisory_xact_lock(hashtextextended(${"versions:" + args.documentId}, 0))`);
    const [last] = await tx
      .select({ n: sql<number>`coalesce(max(${versions.number}), 0)::int` })
      .from(versions)
      .where(eq(versions.documentId, args.documentId));
    const [row] = await tx
      .insert(versions)
      .values({ ...args, number: (last?.n ?? 0) + 1 })
      .returning();
    return row!;
  });
}

export async function listVersions(args: { documentId: string }): Promise<VersionListItem[]> {
  return getDb()
    .select({
      id: versions.id,
      number: versions.number,
      name: versions.name,
      message: versions.message,
      authorId: versions.authorId,
      authorName: users.name,
      createdAt: versions.createdAt,
      kpi: sql<Kpi | null>`${versions.resultSummary} -> 'kpi'`,
      problems: versions.problems,
    })
    .from(versions)
    .leftJoin(users, eq(users.id, versions.authorId))
    .where(eq(versions.documentId, args.documentId))
    .orderBy(desc(versions.number));
}

/** One version of the document (null when it belongs to another document). */
export async function getVersion(args: { documentId: string; versionId: string; tx?: Tx }): Promise<(VersionRow & { authorName: string | null }) | null> {
  const rows = await (args.tx ?? getDb())
    .select({ version: versions, authorName: users.name })
    .from(versions)
    .leftJoin(users, eq(users.id, versions.authorId))
    .where(and(eq(versions.id, args.versionId), eq(versions.documentId, args.documentId)))
    .limit(1);
  const r = rows[0];
  return r ? { ...r.version, authorName: r.authorName } : null;
}
