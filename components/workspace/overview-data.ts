// What the workspace overview shows about documents, read once per request (server only): the
// count and the five edited last, and the documents whose latest review round is still open.
import "server-only";
import { listDocuments } from "@/db/documents";
import { latestRoundStates } from "@/db/reviews";
import type { OpenRound, RecentDocument } from "./recent-documents";

const RECENT = 5;

export async function loadOverviewDocuments(workspaceId: string): Promise<{ total: number; recent: RecentDocument[]; openRounds: OpenRound[] }> {
  // Same query and order as the documents list (updated, newest first; archived ones left out).
  const rows = await listDocuments({ workspaceId, archived: false, sort: "updated", direction: "desc", kpiKey: "fuel_l_per_100km" });
  const rounds = await latestRoundStates({ documentIds: rows.map((r) => r.id) });
  const openRounds: OpenRound[] = [];
  for (const row of rows) {
    const round = rounds.get(row.id);
    if (round?.state === "open") openRounds.push({ documentId: row.id, documentName: row.name, roundId: round.roundId, versionNumber: round.versionNumber });
  }
  const recent = rows.slice(0, RECENT).map((r) => ({ id: r.id, name: r.name, powertrain: r.powertrain, updatedAt: r.updatedAt, summary: r.summary }));
  return { total: rows.length, recent, openRounds };
}
