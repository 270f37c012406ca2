// Rows of the authorization matrix (authz-matrix.test.ts) for versions, diffs, threads and
// reviews. Expected statuses from the product rules (DESIGN §1, issue 6 §6): viewers read,
// reviewers comment and give verdicts, editors also save, restore and ask for reviews, owners
// everything; non-members 404, signed out 401.
import * as diffRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/diff/route";
import * as reviewsRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/reviews/route";
import * as verdictRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/reviews/[roundId]/verdict/route";
import * as threadsRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/threads/route";
import * as threadRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/threads/[threadId]/route";
import * as commentsRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/threads/[threadId]/comments/route";
import * as versionsRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/versions/route";
import * as versionRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/versions/[versionId]/route";
import * as restoreRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/versions/[versionId]/restore/route";
import { insertThread } from "@/db/comments";
import { createDocumentFromDoc, loadDocumentState } from "@/db/document-updates";
import { addMembership } from "@/db/memberships";
import { insertReviewRound } from "@/db/reviews";
import { insertUser } from "@/db/users";
import { insertVersion } from "@/db/versions";
import { createScenarioDoc, readBlocks, setParam } from "@/lib/notebook";
import { call } from "./support/http";

type Caller = { id: string; cookie: string } | null;
type Setup = { workspaceId: string; caller: Caller; ownerId: string };
type Who = "owner" | "editor" | "reviewer" | "viewer" | "outsider" | "signedOut";
type Case = { name: string; send(s: Setup): Promise<Response>; expected: Record<Who, number> };

const readAll = { owner: 200, editor: 200, reviewer: 200, viewer: 200, outsider: 404, signedOut: 401 };
const editors = (ok: number) => ({ owner: ok, editor: ok, reviewer: 403, viewer: 403, outsider: 404, signedOut: 401 });
const commenters = (ok: number) => ({ owner: ok, editor: ok, reviewer: ok, viewer: 403, outsider: 404, signedOut: 401 });
const reviewersAndOwners = (ok: number) => ({ owner: ok, editor: 403, reviewer: ok, viewer: 403, outsider: 404, signedOut: 401 });

/** A van document with one version (saved by the owner), a thread on it, and a review round naming the caller. */
async function fixture(s: Setup) {
  const ydoc = createScenarioDoc("conventional", "Matrix van");
  const doc = await createDocumentFromDoc({ workspaceId: s.workspaceId, name: "Matrix van", powertrain: "conventional", createdBy: s.ownerId, ydoc });
  ydoc.destroy();
  const state = await loadDocumentState({ documentId: doc.id });
  const version = await insertVersion({
    documentId: doc.id, name: "v1", message: "", authorId: s.ownerId, yjsState: state, scenario: null, resultSummary: null, problems: [],
  });
  const { thread } = await insertThread({
    documentId: doc.id, versionId: version.id, anchorKind: "ledger_row", anchorKey: "rolling", anchorLabel: "Loss ledger › Rolling resistance",
    createdBy: s.ownerId, body: "first", mentions: [],
  });
  // inserted directly, so that the verdict row depends on the role only (the API checks who may be named)
  const round = await insertReviewRound({
    documentId: doc.id, versionId: version.id, requestedBy: s.ownerId, message: "", reviewerIds: s.caller ? [s.caller.id] : [s.ownerId],
  });
  const p = { workspaceId: s.workspaceId, documentId: doc.id };
  return { p, versionId: version.id, threadId: thread.id, roundId: round.id, documentId: doc.id };
}

async function extraReviewer(workspaceId: string): Promise<string> {
  const u = await insertUser({ email: `matrix-reviewer-${Math.random().toString(36).slice(2)}@example.com`, name: "Matrix reviewer", passwordHash: "x" });
  await addMembership({ workspaceId, userId: u!.id, role: "reviewer" });
  return u!.id;
}

const D = "/api/workspaces/:workspaceId/documents/:documentId";
const cookie = (s: Setup) => s.caller?.cookie;

export const VERSION_ROUTES: Case[] = [
  { name: `GET ${D}/versions`, expected: readAll, send: async (s) => call(versionsRoute.GET, "GET", "/", { cookie: cookie(s), params: (await fixture(s)).p }) },
  {
    name: `POST ${D}/versions`, expected: editors(201),
    send: async (s) => call(versionsRoute.POST, "POST", "/", { cookie: cookie(s), params: (await fixture(s)).p, body: { name: "v2" } }),
  },
  {
    name: `GET ${D}/versions/:versionId`, expected: readAll,
    send: async (s) => {
      const f = await fixture(s);
      return call(versionRoute.GET, "GET", "/", { cookie: cookie(s), params: { ...f.p, versionId: f.versionId } });
    },
  },
  {
    name: `POST ${D}/versions/:versionId/restore`, expected: editors(200),
    send: async (s) => {
      const f = await fixture(s);
      return call(restoreRoute.POST, "POST", "/", { cookie: cookie(s), params: { ...f.p, versionId: f.versionId } });
    },
  },
  {
    name: `GET ${D}/diff`, expected: readAll,
    send: async (s) => {
      const f = await fixture(s);
      return call(diffRoute.GET, "GET", `/?from=${f.versionId}&to=live`, { cookie: cookie(s), params: f.p });
    },
  },
  { name: `GET ${D}/threads`, expected: readAll, send: async (s) => call(threadsRoute.GET, "GET", "/", { cookie: cookie(s), params: (await fixture(s)).p }) },
  {
    name: `POST ${D}/threads`, expected: commenters(201),
    send: async (s) => {
      const f = await fixture(s);
      return call(threadsRoute.POST, "POST", "/", { cookie: cookie(s), params: f.p, body: { versionId: f.versionId, anchor: { kind: "ledger_row", key: "aero" }, body: "why?" } });
    },
  },
  {
    name: `PATCH ${D}/threads/:threadId`, expected: commenters(200),
    send: async (s) => {
      const f = await fixture(s);
      return call(threadRoute.PATCH, "PATCH", "/", { cookie: cookie(s), params: { ...f.p, threadId: f.threadId }, body: { resolved: true } });
    },
  },
  {
    name: `POST ${D}/threads/:threadId/comments`, expected: commenters(201),
    send: async (s) => {
      const f = await fixture(s);
      return call(commentsRoute.POST, "POST", "/", { cookie: cookie(s), params: { ...f.p, threadId: f.threadId }, body: { body: "agreed" } });
    },
  },
  { name: `GET ${D}/reviews`, expected: readAll, send: async (s) => call(reviewsRoute.GET, "GET", "/", { cookie: cookie(s), params: (await fixture(s)).p }) },
  {
    name: `POST ${D}/reviews`, expected: editors(201),
    send: async (s) => {
      const f = await fixture(s);
      const reviewerId = await extraReviewer(s.workspaceId);
      return call(reviewsRoute.POST, "POST", "/", { cookie: cookie(s), params: f.p, body: { versionId: f.versionId, reviewerIds: [reviewerId] } });
    },
  },
  {
    name: `POST ${D}/reviews/:roundId/verdict`, expected: reviewersAndOwners(200),
    send: async (s) => {
      const f = await fixture(s);
      return call(verdictRoute.POST, "POST", "/", { cookie: cookie(s), params: { ...f.p, roundId: f.roundId }, body: { verdict: "approve" } });
    },
  },
];
