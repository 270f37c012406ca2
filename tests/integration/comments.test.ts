// Comment threads: anchored to a version and a block, parameter or ledger row; mentions send
// e-mail (unless switched off); resolve and reopen; detached when the block leaves the document.
import { beforeAll, describe, expect, it } from "vitest";
import * as threadsRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/threads/route";
import * as threadRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/threads/[threadId]/route";
import * as commentsRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/threads/[threadId]/comments/route";
import * as notificationsRoute from "@/app/api/me/notifications/route";
import { listOutboxMessages } from "@/db/outbox";
import { readBlocks, removeBlock } from "@/lib/notebook";
import { bodyOf, call } from "./support/http";
import { useMailSink } from "./support/mail";
import { teamWorkspace, type TestUser } from "./support/users";
import { editLive, params, saveVersion, vanDocument, type Team } from "./versions-support";
import { loadDocumentState } from "@/db/document-updates";
import { snapshotOfState } from "@/lib/versions";

useMailSink();

let team: Team;
let documentId: string;
let v1: { id: string; number: number };
let bodyBlockId: string;

beforeAll(async () => {
  team = await teamWorkspace();
  documentId = await vanDocument(team);
  v1 = (await saveVersion(team, documentId, team.editor, "Baseline")).body.version;
  bodyBlockId = snapshotOfState(await loadDocumentState({ documentId })).blocks.find((b) => b.kind === "body")!.id;
});

const handle = (u: TestUser) => u.email.split("@")[0];

async function openThread(by: TestUser, anchor: { kind: string; key: string }, body: string) {
  const res = await call(threadsRoute.POST, "POST", "/", { cookie: by.cookie, params: params(team, documentId), body: { versionId: v1.id, anchor, body } });
  return { status: res.status, body: await bodyOf(res) };
}

async function mailsTo(u: TestUser) {
  return (await listOutboxMessages({ limit: 500 })).filter((m) => m.to.includes(u.email));
}

describe("threads", () => {
  it("a reviewer comments on the rolling-resistance ledger row and mentions the editor, who gets an e-mail with a link back", async () => {
    const before = (await mailsTo(team.editor)).length;
    const t = await openThread(team.reviewer, { kind: "ledger_row", key: "rolling" }, `@${handle(team.editor)} your **c_r** looks optimistic <script>`);
    expect(t.status).toBe(201);
    expect(t.body.thread).toMatchObject({
      anchor: { kind: "ledger_row", key: "rolling", label: "Loss ledger › Rolling resistance" },
      detached: false, resolved: null, version: { id: v1.id, number: 1 },
    });
    expect(t.body.thread.comments[0]).toMatchObject({ author: { id: team.reviewer.id }, mentions: [team.editor.id] });
    // stored as written; pages render it through the markup tokens (escaped)
    expect(t.body.thread.comments[0].body).toContain("<script>");
    const mails = await mailsTo(team.editor);
    expect(mails.length).toBe(before + 1);
    const mail = mails[0]!;
    expect(mail.subject).toMatch(/mentioned you/);
    expect(mail.text).toContain(`/w/${team.workspaceId}/documents/${documentId}/versions/${v1.id}#thread-${t.body.thread.id}`);
    expect(mail.html).not.toContain("<script>");
    expect(mail.html).toContain("&lt;script&gt;");
  });

  it("replies, resolve by a reviewer, reopen by an editor; viewers read but cannot write", async () => {
    const t = (await openThread(team.editor, { kind: "parameter", key: `${bodyBlockId}/mass` }, "is this the laden mass?")).body.thread;
    expect(t.anchor.label).toBe("Body & road load › test mass");
    const p = params(team, documentId, { threadId: t.id });
    const reply = await call(commentsRoute.POST, "POST", "/", { cookie: team.reviewer.cookie, params: p, body: { body: "_yes_, with driver" } });
    expect(reply.status).toBe(201);
    expect((await bodyOf(reply)).thread.comments).toHaveLength(2);
    const resolved = await bodyOf(await call(threadRoute.PATCH, "PATCH", "/", { cookie: team.reviewer.cookie, params: p, body: { resolved: true } }));
    expect(resolved.thread.resolved.by.id).toBe(team.reviewer.id);
    const reopened = await bodyOf(await call(threadRoute.PATCH, "PATCH", "/", { cookie: team.editor.cookie, params: p, body: { resolved: false } }));
    expect(reopened.thread.resolved).toBeNull();
    expect((await call(commentsRoute.POST, "POST", "/", { cookie: team.viewer.cookie, params: p, body: { body: "me too" } })).status).toBe(403);
    expect((await call(threadRoute.PATCH, "PATCH", "/", { cookie: team.viewer.cookie, params: p, body: { resolved: true } })).status).toBe(403);
    expect((await openThread(team.viewer, { kind: "block", key: bodyBlockId }, "hello")).status).toBe(403);
    expect((await openThread(team.outsider, { kind: "block", key: bodyBlockId }, "hello")).status).toBe(404);
    const list = await call(threadsRoute.GET, "GET", `/?versionId=${v1.id}`, { cookie: team.viewer.cookie, params: params(team, documentId) });
    expect(list.status).toBe(200);
    expect((await bodyOf(list)).threads.some((x: { id: string }) => x.id === t.id)).toBe(true);
  });

  it("anchors are checked against the version: unknown rows, blocks and fields are refused with the field named", async () => {
    const row = await openThread(team.reviewer, { kind: "ledger_row", key: "tyres" }, "x");
    expect(row.status).toBe(422);
    expect(row.body.fields["anchor.key"]).toMatch(/not a ledger row/);
    const block = await openThread(team.reviewer, { kind: "block", key: "b-no-such-block" }, "x");
    expect(block.status).toBe(422);
    expect((await openThread(team.reviewer, { kind: "parameter", key: `${bodyBlockId}/no_field` }, "x")).status).toBe(422);
    expect((await openThread(team.reviewer, { kind: "block", key: bodyBlockId }, "  ")).body.fields.body).toMatch(/write a comment/);
  });

  it("a thread on a block that was later deleted stays readable and is marked detached", async () => {
    const noteId = snapshotOfState(await loadDocumentState({ documentId })).blocks.find((b) => b.kind === "note")!.id;
    const t = (await openThread(team.reviewer, { kind: "block", key: noteId }, "drop this note?")).body.thread;
    expect(t.detached).toBe(false);
    await editLive(documentId, (doc) => removeBlock(doc, readBlocks(doc).find((b) => b.id === noteId)!.id));
    const { threads } = await bodyOf(await call(threadsRoute.GET, "GET", "/", { cookie: team.viewer.cookie, params: params(team, documentId) }));
    const again = threads.find((x: { id: string }) => x.id === t.id);
    expect(again.detached).toBe(true);
    expect(again.anchor.label).toBe("Note");
    expect(again.comments[0].body).toBe("drop this note?");
  });

  it("no mention e-mail when the member switched mentions off", async () => {
    const put = await call(notificationsRoute.PUT, "PUT", "/", { cookie: team.viewer.cookie, body: { reviewRequests: true, mentions: false, verdicts: true } });
    expect(put.status).toBe(200);
    const got = await bodyOf(await call(notificationsRoute.GET, "GET", "/", { cookie: team.viewer.cookie }));
    expect(got.settings).toEqual({ reviewRequests: true, mentions: false, verdicts: true });
    const before = (await mailsTo(team.viewer)).length;
    const t = await openThread(team.reviewer, { kind: "ledger_row", key: "aero" }, `FYI @${handle(team.viewer)}`);
    expect(t.body.thread.comments[0].mentions).toEqual([team.viewer.id]);
    expect((await mailsTo(team.viewer)).length).toBe(before);
  });
});
