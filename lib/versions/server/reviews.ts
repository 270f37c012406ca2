// Review rounds: an editor asks named reviewers to review one version; each approves or
// requests changes with a comment; the round's state follows from the verdicts.
import { listMembers } from "@/db/memberships";
import { getReviewRound, insertReviewRound, listReviewRounds, recordVerdict, type RoundItem, type Verdict } from "@/db/reviews";
import { listVersions } from "@/db/versions";
import { can, isUuid } from "@/lib/authz";
import { Forbidden, NotFound, Unprocessable } from "@/lib/http/errors";
import { authorizeDocument, requireVersion } from "./access";
import { absolute, diffPath, reviewsPath, versionPath } from "./links";
import { reviewRequestMail, verdictMail } from "./mail";
import { notify } from "./notify";

type DocArgs = { userId: string; workspaceId: string; documentId: string };

export interface RoundJson {
  id: string;
  version: { id: string; number: number; name: string };
  requestedBy: { id: string; name: string } | null;
  message: string;
  state: RoundItem["state"];
  createdAt: string;
  /** the version before the reviewed one, for "what changed" links (null for the first version) */
  previousVersionId: string | null;
  reviewers: { id: string; name: string; verdict: Verdict | null; comment: string; decidedAt: string | null }[];
}

function roundJson(r: RoundItem, previousVersionId: string | null): RoundJson {
  return {
    id: r.id,
    version: { id: r.versionId, number: r.versionNumber, name: r.versionName },
    requestedBy: r.requestedBy && r.requestedByName !== null ? { id: r.requestedBy, name: r.requestedByName } : null,
    message: r.message,
    state: r.state,
    createdAt: r.createdAt.toISOString(),
    previousVersionId,
    reviewers: r.reviewers.map((x) => ({ id: x.reviewerId, name: x.reviewerName, verdict: x.verdict, comment: x.comment, decidedAt: x.decidedAt?.toISOString() ?? null })),
  };
}

/** The version saved just before `number` (versions are numbered 1, 2, 3 … per document). */
async function previousVersions(documentId: string): Promise<Map<number, string>> {
  const list = await listVersions({ documentId });
  return new Map(list.map((v) => [v.number, v.id]));
}

const prevOf = (byNumber: Map<number, string>, n: number): string | null => {
  for (let k = n - 1; k >= 1; k--) if (byNumber.has(k)) return byNumber.get(k)!;
  return null;
};

export async function readRounds(args: DocArgs): Promise<RoundJson[]> {
  await authorizeDocument({ ...args, action: "version.read" });
  const [rounds, byNumber] = await Promise.all([listReviewRounds(args), previousVersions(args.documentId)]);
  return rounds.map((r) => roundJson(r, prevOf(byNumber, r.versionNumber)));
}

async function readRound(documentId: string, roundId: string): Promise<RoundJson> {
  const r = await getReviewRound({ documentId, roundId });
  if (!r) throw new NotFound("review round not found");
  return roundJson(r, prevOf(await previousVersions(documentId), r.versionNumber));
}

export async function requestReview(args: DocArgs & { versionId: string; reviewerIds: string[]; message: string }): Promise<RoundJson> {
  const { document } = await authorizeDocument({ ...args, action: "review.request" });
  const version = await requireVersion(args);
  const members = await listMembers({ workspaceId: args.workspaceId });
  const ids = [...new Set(args.reviewerIds)];
  const fields: Record<string, string> = {};
  ids.forEach((id, i) => {
    const m = members.find((x) => x.userId === id);
    if (!m) fields[`reviewerIds.${i}`] = "is not a member of this workspace";
    else if (id === args.userId) fields[`reviewerIds.${i}`] = "you cannot review your own request; name someone else";
    else if (!can(m.role, "review.verdict")) fields[`reviewerIds.${i}`] = `${m.name} is ${m.role === "editor" ? "an" : "a"} ${m.role} and cannot give verdicts (reviewers and owners can)`;
  });
  if (Object.keys(fields).length > 0) throw new Unprocessable(fields, "some reviewers cannot review this version");
  const round = await insertReviewRound({ documentId: args.documentId, versionId: args.versionId, requestedBy: args.userId, message: args.message, reviewerIds: ids });
  const json = await readRound(args.documentId, round.id);
  const requester = members.find((m) => m.userId === args.userId)?.name ?? "A colleague";
  const path = json.previousVersionId
    ? diffPath(args.workspaceId, args.documentId, json.previousVersionId, version.id)
    : versionPath(args.workspaceId, args.documentId, version.id);
  const mail = reviewRequestMail({ requester, document: document.name, version: `v${version.number} "${version.name}"`, message: args.message, link: absolute(`${path}${path.includes("?") ? "&" : "?"}round=${round.id}`) });
  await notify({ to: members.filter((m) => ids.includes(m.userId)), kind: "reviewRequests", mail });
  return json;
}

export async function giveVerdict(args: DocArgs & { roundId: string; verdict: Verdict; comment: string }): Promise<RoundJson> {
  const { document } = await authorizeDocument({ ...args, action: "review.verdict" });
  const round = isUuid(args.roundId) ? await getReviewRound({ documentId: args.documentId, roundId: args.roundId }) : null;
  if (!round) throw new NotFound("review round not found");
  const state = await recordVerdict({ roundId: round.id, reviewerId: args.userId, verdict: args.verdict, comment: args.comment });
  if (state === null) throw new Forbidden("you are not one of the reviewers of this round");
  if (round.requestedBy && round.requestedBy !== args.userId) {
    const members = await listMembers({ workspaceId: args.workspaceId });
    const requester = members.find((m) => m.userId === round.requestedBy);
    const reviewer = members.find((m) => m.userId === args.userId)?.name ?? "A reviewer";
    if (requester) {
      const mail = verdictMail({
        reviewer, document: document.name, version: `v${round.versionNumber} "${round.versionName}"`, verdict: args.verdict, comment: args.comment,
        link: absolute(reviewsPath(args.workspaceId, args.documentId, round.id)),
      });
      await notify({ to: [requester], kind: "verdicts", mail });
    }
  }
  return readRound(args.documentId, round.id);
}
