// Comment threads anchored to a version and to a block, a parameter or a ledger row.
import { loadDocumentState } from "@/db/document-updates";
import { getThread, insertComment, insertThread, listThreads, setThreadResolved, type ThreadItem } from "@/db/comments";
import { listMembers } from "@/db/memberships";
import { fieldLabel, type DocSnapshot } from "@/lib/notebook";
import { isUuid } from "@/lib/authz";
import { NotFound, Unprocessable } from "@/lib/http/errors";
import { anchorLabel, anchorProblem, isDetached, type Anchor } from "../anchors";
import { snapshotOfState } from "../content";
import { LEDGER_LABELS } from "../labels";
import { resolveMentions } from "../markup";
import { authorizeDocument, requireVersion } from "./access";
import { absolute, versionPath } from "./links";
import { mentionMail } from "./mail";
import { notify } from "./notify";

type DocArgs = { userId: string; workspaceId: string; documentId: string };

export interface CommentJson {
  id: string;
  author: { id: string; name: string } | null;
  body: string;
  createdAt: string;
  mentions: string[];
}

export interface ThreadJson {
  id: string;
  version: { id: string; number: number; name: string };
  anchor: Anchor & { label: string };
  /** the anchored block or parameter is no longer in the live document */
  detached: boolean;
  createdBy: { id: string; name: string } | null;
  createdAt: string;
  resolved: { at: string; by: { id: string; name: string } | null } | null;
  comments: CommentJson[];
}

const person = (id: string | null, name: string | null) => (id && name !== null ? { id, name } : null);

function threadJson(t: ThreadItem, live: DocSnapshot): ThreadJson {
  const anchor = { kind: t.anchorKind, key: t.anchorKey };
  return {
    id: t.id,
    version: { id: t.versionId, number: t.versionNumber, name: t.versionName },
    anchor: { ...anchor, label: t.anchorLabel },
    detached: isDetached(anchor, live),
    createdBy: person(t.createdBy, t.createdByName),
    createdAt: t.createdAt.toISOString(),
    resolved: t.resolvedAt ? { at: t.resolvedAt.toISOString(), by: person(t.resolvedBy, t.resolvedByName) } : null,
    comments: t.comments.map((c) => ({ id: c.id, author: person(c.authorId, c.authorName), body: c.body, createdAt: c.createdAt.toISOString(), mentions: c.mentions })),
  };
}

async function liveSnapshot(documentId: string): Promise<DocSnapshot> {
  return snapshotOfState(await loadDocumentState({ documentId }));
}

export async function readThreads(args: DocArgs & { versionId?: string }): Promise<ThreadJson[]> {
  await authorizeDocument({ ...args, action: "comment.read" });
  if (args.versionId !== undefined && !isUuid(args.versionId)) throw new NotFound("version not found");
  const [threads, live] = await Promise.all([listThreads({ documentId: args.documentId, versionId: args.versionId }), liveSnapshot(args.documentId)]);
  return threads.map((t) => threadJson(t, live));
}

async function readOne(documentId: string, threadId: string): Promise<ThreadJson> {
  const [threads, live] = await Promise.all([listThreads({ documentId }), liveSnapshot(documentId)]);
  const t = threads.find((x) => x.id === threadId);
  if (!t) throw new NotFound("thread not found");
  return threadJson(t, live);
}

async function mentionsOf(args: DocArgs & { body: string }) {
  const members = await listMembers({ workspaceId: args.workspaceId });
  return resolveMentions(args.body, members).filter((m) => m.userId !== args.userId);
}

async function sendMentions(args: DocArgs & { body: string; threadId: string; versionId: string; anchor: string; documentName: string; mentioned: { userId: string; email: string }[] }) {
  if (args.mentioned.length === 0) return;
  const members = await listMembers({ workspaceId: args.workspaceId });
  const author = members.find((m) => m.userId === args.userId)?.name ?? "A colleague";
  const link = absolute(`${versionPath(args.workspaceId, args.documentId, args.versionId)}#thread-${args.threadId}`);
  await notify({ to: args.mentioned, kind: "mentions", mail: mentionMail({ author, document: args.documentName, anchor: args.anchor, body: args.body, link }) });
}

export async function createThread(args: DocArgs & { versionId: string; anchor: Anchor; body: string }): Promise<ThreadJson> {
  const { document } = await authorizeDocument({ ...args, action: "comment.write" });
  const version = await requireVersion(args);
  const problem = anchorProblem(args.anchor);
  if (problem) throw new Unprocessable({ [problem.split(":")[0]!]: problem });
  const snapshot = snapshotOfState(version.yjsState);
  if (isDetached(args.anchor, snapshot)) throw new Unprocessable({ "anchor.key": `version ${version.number} has no ${args.anchor.kind === "block" ? "block" : "parameter"} "${args.anchor.key}"` });
  const label = anchorLabel(args.anchor, snapshot, LEDGER_LABELS, (kind, key) => fieldLabel(kind as Parameters<typeof fieldLabel>[0], key).split(" › ").pop()!);
  const mentioned = await mentionsOf(args);
  const { thread } = await insertThread({
    documentId: args.documentId, versionId: args.versionId, anchorKind: args.anchor.kind, anchorKey: args.anchor.key, anchorLabel: label,
    createdBy: args.userId, body: args.body, mentions: mentioned.map((m) => m.userId),
  });
  await sendMentions({ ...args, threadId: thread.id, anchor: label, documentName: document.name, mentioned });
  return readOne(args.documentId, thread.id);
}

export async function replyToThread(args: DocArgs & { threadId: string; body: string }): Promise<ThreadJson> {
  const { document } = await authorizeDocument({ ...args, action: "comment.write" });
  const thread = isUuid(args.threadId) ? await getThread(args) : null;
  if (!thread) throw new NotFound("thread not found");
  const mentioned = await mentionsOf(args);
  await insertComment({ threadId: thread.id, authorId: args.userId, body: args.body, mentions: mentioned.map((m) => m.userId) });
  await sendMentions({ ...args, versionId: thread.versionId, anchor: thread.anchorLabel, documentName: document.name, mentioned });
  return readOne(args.documentId, thread.id);
}

export async function setResolved(args: DocArgs & { threadId: string; resolved: boolean }): Promise<ThreadJson> {
  await authorizeDocument({ ...args, action: "comment.resolve" });
  const thread = isUuid(args.threadId) ? await getThread(args) : null;
  if (!thread) throw new NotFound("thread not found");
  await setThreadResolved({ threadId: thread.id, userId: args.resolved ? args.userId : null });
  return readOne(args.documentId, thread.id);
}

