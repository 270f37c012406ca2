// Queries on review rounds and the per-reviewer requests in them.
import { and, desc, eq, inArray, sql } from "drizzle-orm";
import { getDb, type Tx } from "./pool";
import { reviewRequests, reviewRounds, users, versions } from "./schema";

export type ReviewState = (typeof reviewRounds.$inferSelect)["state"];
export type Verdict = NonNullable<(typeof reviewRequests.$inferSelect)["verdict"]>;
export type RoundRow = typeof reviewRounds.$inferSelect;

export interface ReviewerItem {
  reviewerId: string;
  reviewerName: string;
  reviewerEmail: string;
  verdict: Verdict | null;
  comment: string;
  decidedAt: Date | null;
}

export interface RoundItem extends RoundRow {
  versionNumber: number;
  versionName: string;
  requestedByName: string | null;
  reviewers: ReviewerItem[];
}

/** The round's state from its verdicts: any "changes requested" wins; all approvals approve. */
export function roundState(verdicts: readonly (Verdict | null)[]): ReviewState {
  if (verdicts.some((v) => v === "changes_requested")) return "changes_requested";
  if (verdicts.length > 0 && verdicts.every((v) => v === "approve")) return "approved";
  return "open";
}

export async function insertReviewRound(args: {
  documentId: string;
  versionId: string;
  requestedBy: string;
  message: string;
  reviewerIds: string[];
}): Promise<RoundRow> {
  return getDb().transaction(async (tx) => {
    const [round] = await tx
      .insert(reviewRounds)
      .values({ documentId: args.documentId, versionId: args.versionId, requestedBy: args.requestedBy, message: args.message })
      .returning();
    await tx.insert(reviewRequests).values(args.reviewerIds.map((reviewerId) => ({ roundId: round!.id, reviewerId })));
    return round!;
  });
}

async function withDetails(rounds: { round: RoundRow; versionNumber: number; versionName: string; requestedByName: string | null }[]): Promise<RoundItem[]> {
  if (rounds.length === 0) return [];
  const requests = await getDb()
    .select({
      roundId: reviewRequests.roundId, reviewerId: reviewRequests.reviewerId, reviewerName: users.name, reviewerEmail: users.email,
      verdict: reviewRequests.verdict, comment: reviewRequests.comment, decidedAt: reviewRequests.decidedAt,
    })
    .from(reviewRequests)
    .innerJoin(users, eq(users.id, reviewRequests.reviewerId))
    .where(inArray(reviewRequests.roundId, rounds.map((r) => r.round.id)))
    .orderBy(users.name);
  return rounds.map((r) => ({
    ...r.round,
    versionNumber: r.versionNumber,
    versionName: r.versionName,
    requestedByName: r.requestedByName,
    reviewers: requests.filter((q) => q.roundId === r.round.id).map(({ roundId: _r, ...q }) => q),
  }));
}

function roundQuery() {
  const requester = sql<string | null>`(select name from ${users} where ${users.id} = ${reviewRounds.requestedBy})`;
  return getDb()
    .select({ round: reviewRounds, versionNumber: versions.number, versionName: versions.name, requestedByName: requester })
    .from(reviewRounds)
    .innerJoin(versions, eq(versions.id, reviewRounds.versionId));
}

/** Rounds of a document, newest first, with reviewers and their verdicts. */
export async function listReviewRounds(args: { documentId: string }): Promise<RoundItem[]> {
  const rounds = await roundQuery().where(eq(reviewRounds.documentId, args.documentId)).orderBy(desc(reviewRounds.createdAt), desc(reviewRounds.id));
  return withDetails(rounds);
}

export async function getReviewRound(args: { documentId: string; roundId: string }): Promise<RoundItem | null> {
  const rounds = await roundQuery().where(and(eq(reviewRounds.id, args.roundId), eq(reviewRounds.documentId, args.documentId)));
  return (await withDetails(rounds))[0] ?? null;
}

/**
 * Records a reviewer's verdict and recomputes the round's state, in one transaction with the
 * round row locked, so two verdicts at once cannot both read the old state. Returns the new
 * state, or null when the user is not a reviewer of the round.
 */
export async function recordVerdict(args: { roundId: string; reviewerId: string; verdict: Verdict; comment: string }): Promise<ReviewState | null> {
  return getDb().transaction(async (tx: Tx) => {
    await tx.select({ id: reviewRounds.id }).from(reviewRounds).where(eq(reviewRounds.id, args.roundId)).for("update");
    const updated = await tx
      .update(reviewRequests)
      .set({ verdict: args.verdict, comment: args.comment, decidedAt: sql`now()` })
      .where(and(eq(reviewRequests.roundId, args.roundId), eq(reviewRequests.reviewerId, args.reviewerId)))
      .returning({ id: reviewRequests.id });
    if (updated.length === 0) return null;
    const all = await tx.select({ verdict: reviewRequests.verdict }).from(reviewRequests).where(eq(reviewRequests.roundId, args.roundId));
    const state = roundState(all.map((r) => r.verdict));
    await tx.update(reviewRounds).set({ state }).where(eq(reviewRounds.id, args.roundId));
    return state;
  });
}

/** The latest round of each document (for the documents table): state, version number and counts. */
export async function latestRoundStates(args: { documentIds: string[] }): Promise<Map<string, { roundId: string; state: ReviewState; versionNumber: number; createdAt: Date }>> {
  const out = new Map<string, { roundId: string; state: ReviewState; versionNumber: number; createdAt: Date }>();
  if (args.documentIds.length === 0) return out;
  const rows = await getDb()
    .selectDistinctOn([reviewRounds.documentId], {
      documentId: reviewRounds.documentId, roundId: reviewRounds.id, state: reviewRounds.state, versionNumber: versions.number, createdAt: reviewRounds.createdAt,
    })
    .from(reviewRounds)
    .innerJoin(versions, eq(versions.id, reviewRounds.versionId))
    .where(inArray(reviewRounds.documentId, args.documentIds))
    .orderBy(reviewRounds.documentId, desc(reviewRounds.createdAt), desc(reviewRounds.id));
  for (const r of rows) out.set(r.documentId, { roundId: r.roundId, state: r.state, versionNumber: r.versionNumber, createdAt: r.createdAt });
  return out;
}
