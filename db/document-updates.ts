// The Yjs state of documents in PostgreSQL: one snapshot row (a merged update) per document plus
// the update rows appended since. Loading merges both; compaction folds the rows into the
// snapshot in one transaction. Used by the collaboration server, the documents API, versions
// and the seed.
import { asc, eq, inArray, sql } from "drizzle-orm";
import * as Y from "yjs";
import type { PowertrainKind } from "@/lib/notebook/block-kinds";
import { insertDocument, type DocumentRow } from "./documents";
import { getDb, type Tx } from "./pool";
import { documentSnapshots, documentUpdates, type DocumentSummary } from "./schema";

/** Applies stored updates to a fresh doc; a corrupt row is logged and skipped, not fatal. */
function mergeIntoDoc(documentId: string, parts: Uint8Array[]): Y.Doc {
  const doc = new Y.Doc();
  for (const part of parts) {
    try {
      Y.applyUpdate(doc, part);
    } catch (error) {
      console.error(`[documents] skipped an unreadable update of document ${documentId}:`, error);
    }
  }
  return doc;
}

async function readParts(tx: Tx, documentId: string): Promise<{ parts: Uint8Array[]; updateCount: number; found: boolean }> {
  const snap = await tx.select({ state: documentSnapshots.state }).from(documentSnapshots).where(eq(documentSnapshots.documentId, documentId));
  const rows = await tx
    .select({ update: documentUpdates.update })
    .from(documentUpdates)
    .where(eq(documentUpdates.documentId, documentId))
    .orderBy(asc(documentUpdates.seq));
  const parts = [...snap.map((s) => s.state), ...rows.map((r) => r.update)];
  return { parts, updateCount: rows.length, found: snap.length > 0 || rows.length > 0 };
}

/**
 * The whole state of a document as one Yjs update (snapshot + every update row), and how many
 * update rows are waiting for compaction. Both reads see one database snapshot (repeatable read),
 * so a compaction committing in between cannot hide rows.
 */
export async function loadDocumentStateWithCount(args: { documentId: string }): Promise<{ state: Uint8Array; updateCount: number }> {
  const { parts, updateCount } = await getDb().transaction((tx) => readParts(tx, args.documentId), {
    isolationLevel: "repeatable read",
    accessMode: "read only",
  });
  const doc = mergeIntoDoc(args.documentId, parts);
  const state = Y.encodeStateAsUpdate(doc);
  doc.destroy();
  return { state, updateCount };
}

export async function loadDocumentState(args: { documentId: string }): Promise<Uint8Array> {
  return (await loadDocumentStateWithCount(args)).state;
}

/** Appends one Yjs update; returns its seq. */
export async function appendDocumentUpdate(args: { documentId: string; update: Uint8Array; tx?: Tx }): Promise<number> {
  const [seq] = await appendDocumentUpdates({ documentId: args.documentId, updates: [args.update], tx: args.tx });
  return seq!;
}

/** Appends several updates in one statement (the collaboration server batches what arrived together). */
export async function appendDocumentUpdates(args: { documentId: string; updates: Uint8Array[]; tx?: Tx }): Promise<number[]> {
  if (args.updates.length === 0) return [];
  const rows = await (args.tx ?? getDb())
    .insert(documentUpdates)
    .values(args.updates.map((update) => ({ documentId: args.documentId, update })))
    .returning({ seq: documentUpdates.seq });
  return rows.map((r) => r.seq);
}

/**
 * Folds every update row of the document into its snapshot, in one transaction. A transaction-level
 * advisory lock keeps two compactions of one document apart; the rows merged are exactly the rows
 * deleted (DELETE … RETURNING), so an update committed meanwhile is either merged or left as a row.
 * Returns how many rows were folded in.
 */
export async function compactDocumentUpdates(args: { documentId: string }): Promise<number> {
  return getDb().transaction(async (tx) => {
    await tx.execute(sql`select pg_advisory_xact_lock(hashtextextended(${"document:" + args.documentId}, 0))`);
    const snap = await tx.select({ state: documentSnapshots.state }).from(documentSnapshots).where(eq(documentSnapshots.documentId, args.documentId));
    const deleted = await tx
      .delete(documentUpdates)
      .where(eq(documentUpdates.documentId, args.documentId))
      .returning({ seq: documentUpdates.seq, update: documentUpdates.update });
    if (deleted.length === 0) return 0;
    deleted.sort((a, b) => a.seq - b.seq);
    const doc = mergeIntoDoc(args.documentId, [...snap.map((s) => s.state), ...deleted.map((d) => d.update)]);
    const state = Y.encodeStateAsUpdate(doc);
    doc.destroy();
    const uptoSeq = deleted[deleted.length - 1]!.seq;
    await writeSnapshot(tx, args.documentId, state, uptoSeq);
    return deleted.length;
  });
}

async function writeSnapshot(tx: Tx, documentId: string, state: Uint8Array, uptoSeq: number): Promise<void> {
  await tx
    .insert(documentSnapshots)
    .values({ documentId, state, uptoSeq })
    .onConflictDoUpdate({
      target: documentSnapshots.documentId,
      set: { state, uptoSeq: sql`greatest(${documentSnapshots.uptoSeq}, ${uptoSeq})`, updatedAt: sql`now()` },
    });
}

export async function countDocumentUpdates(args: { documentId: string }): Promise<number> {
  const [row] = await getDb()
    .select({ n: sql<number>`count(*)::int` })
    .from(documentUpdates)
    .where(eq(documentUpdates.documentId, args.documentId));
  return row?.n ?? 0;
}

/** Snapshot row counts per document (tests and diagnostics). */
export async function countDocumentSnapshots(args: { documentIds: string[] }): Promise<number> {
  if (args.documentIds.length === 0) return 0;
  const [row] = await getDb()
    .select({ n: sql<number>`count(*)::int` })
    .from(documentSnapshots)
    .where(inArray(documentSnapshots.documentId, args.documentIds));
  return row?.n ?? 0;
}

/** Creates a document row and stores `ydoc`'s state as its first snapshot, in one transaction. */
export async function createDocumentFromDoc(args: {
  workspaceId: string;
  name: string;
  powertrain: PowertrainKind;
  createdBy: string | null;
  ydoc: Y.Doc;
  summary?: DocumentSummary | null;
}): Promise<DocumentRow> {
  const state = Y.encodeStateAsUpdate(args.ydoc);
  return createDocumentFromState({ ...args, state });
}

export async function createDocumentFromState(args: {
  workspaceId: string;
  name: string;
  powertrain: PowertrainKind;
  createdBy: string | null;
  state: Uint8Array;
  summary?: DocumentSummary | null;
}): Promise<DocumentRow> {
  return getDb().transaction(async (tx) => {
    const row = await insertDocument({ ...args, tx });
    await writeSnapshot(tx, row.id, args.state, 0);
    return row;
  });
}

/**
 * Applies `change` to the stored state of a document and appends the resulting update as a row
 * (for changes made outside a live session, e.g. a rename through the API). Returns the update,
 * or null when `change` changed nothing. A collaboration server holding the document in memory
 * does not see the row until it loads the document again; Yjs merges it then.
 */
export async function appendDocumentChange(args: { documentId: string; change: (doc: Y.Doc) => void }): Promise<Uint8Array | null> {
  const doc = new Y.Doc();
  Y.applyUpdate(doc, await loadDocumentState({ documentId: args.documentId }));
  const updates: Uint8Array[] = [];
  doc.on("update", (u: Uint8Array) => updates.push(u));
  doc.transact(() => args.change(doc));
  doc.destroy();
  if (updates.length === 0) return null;
  const update = Y.mergeUpdates(updates);
  await appendDocumentUpdate({ documentId: args.documentId, update });
  return update;
}
