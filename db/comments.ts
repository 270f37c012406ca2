// Queries on comment threads and their comments.
import { and, asc, eq, inArray, isNull, sql } from "drizzle-orm";
import { getDb, type Tx } from "./pool";
import { comments, commentThreads, users, versions } from "./schema";
import type { AnchorKind } from "@/lib/versions/anchors";

export type ThreadRow = typeof commentThreads.$inferSelect;
export type CommentRow = typeof comments.$inferSelect;

export interface CommentItem {
  id: string;
  authorId: string | null;
  authorName: string | null;
  body: string;
  createdAt: Date;
  mentions: string[];
}

export interface ThreadItem extends ThreadRow {
  versionNumber: number;
  versionName: string;
  createdByName: string | null;
  resolvedByName: string | null;
  comments: CommentItem[];
}

/** A thread and its first comment, in one transaction. */
export async function insertThread(args: {
  documentId: string;
  versionId: string;
  anchorKind: AnchorKind;
  anchorKey: string;
  anchorLabel: string;
  createdBy: string;
  body: string;
  mentions: string[];
}): Promise<{ thread: ThreadRow; comment: CommentRow }> {
  return getDb().transaction(async (tx) => {
    const [thread] = await tx
      .insert(commentThreads)
      .values({
        documentId: args.documentId, versionId: args.versionId, anchorKind: args.anchorKind, anchorKey: args.anchorKey,
        anchorLabel: args.anchorLabel, createdBy: args.createdBy,
      })
      .returning();
    const comment = await insertComment({ threadId: thread!.id, authorId: args.createdBy, body: args.body, mentions: args.mentions, tx });
    return { thread: thread!, comment };
  });
}

export async function insertComment(args: { threadId: string; authorId: string; body: string; mentions: string[]; tx?: Tx }): Promise<CommentRow> {
  const [row] = await (args.tx ?? getDb())
    .insert(comments)
    .values({ threadId: args.threadId, authorId: args.authorId, body: args.body, mentions: args.mentions })
    .returning();
  return row!;
}

/** A thread of the document (null when it belongs to another one). */
export async function getThread(args: { documentId: string; threadId: string }): Promise<ThreadRow | null> {
  const rows = await getDb()
    .select()
    .from(commentThreads)
    .where(and(eq(commentThreads.id, args.threadId), eq(commentThreads.documentId, args.documentId)))
    .limit(1);
  return rows[0] ?? null;
}

/** Resolves (by `userId`) or reopens (userId null) a thread; returns the updated row. */
export async function setThreadResolved(args: { threadId: string; userId: string | null }): Promise<ThreadRow | null> {
  const [row] = await getDb()
    .update(commentThreads)
    .set(args.userId ? { resolvedAt: sql`now()`, resolvedBy: args.userId } : { resolvedAt: null, resolvedBy: null })
    .where(eq(commentThreads.id, args.threadId))
    .returning();
  return row ?? null;
}

/** Author ids of the thread's comments (for reply notifications). */
export async function listThreadParticipants(args: { threadId: string }): Promise<string[]> {
  const rows = await getDb()
    .selectDistinct({ id: comments.authorId })
    .from(comments)
    .where(eq(comments.threadId, args.threadId));
  return rows.map((r) => r.id).filter((x): x is string => x !== null);
}

/** Threads of a document (optionally of one version, optionally only open ones), oldest first, with comments. */
export async function listThreads(args: { documentId: string; versionId?: string; openOnly?: boolean }): Promise<ThreadItem[]> {
  const creator = sql<string | null>`(select name from ${users} where ${users.id} = ${commentThreads.createdBy})`;
  const resolver = sql<string | null>`(select name from ${users} where ${users.id} = ${commentThreads.resolvedBy})`;
  const where = [eq(commentThreads.documentId, args.documentId)];
  if (args.versionId) where.push(eq(commentThreads.versionId, args.versionId));
  if (args.openOnly) where.push(isNull(commentThreads.resolvedAt));
  const threads = await getDb()
    .select({ thread: commentThreads, versionNumber: versions.number, versionName: versions.name, createdByName: creator, resolvedByName: resolver })
    .from(commentThreads)
    .innerJoin(versions, eq(versions.id, commentThreads.versionId))
    .where(and(...where))
    .orderBy(asc(commentThreads.createdAt), asc(commentThreads.id));
  if (threads.length === 0) return [];
  const rows = await getDb()
    .select({
      id: comments.id, threadId: comments.threadId, authorId: comments.authorId, authorName: users.name, body: comments.body,
      createdAt: comments.createdAt, mentions: comments.mentions,
    })
    .from(comments)
    .leftJoin(users, eq(users.id, comments.authorId))
    .where(inArray(comments.threadId, threads.map((t) => t.thread.id)))
    .orderBy(asc(comments.createdAt), asc(comments.id));
  return threads.map((t) => ({
    ...t.thread,
    versionNumber: t.versionNumber,
    versionName: t.versionName,
    createdByName: t.createdByName,
    resolvedByName: t.resolvedByName,
    comments: rows.filter((c) => c.threadId === t.thread.id).map(({ threadId: _t, ...c }) => c),
  }));
}
