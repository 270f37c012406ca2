// Review rounds: an editor asks named reviewers to review a version; verdicts with comments;
// the round's state follows (any "changes requested" wins, all approvals approve); e-mails.
import { beforeAll, describe, expect, it } from "vitest";
import * as reviewsRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/reviews/route";
import * as documentsRoute from "@/app/api/workspaces/[workspaceId]/documents/route";
import * as verdictRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/reviews/[roundId]/verdict/route";
import { addMembership } from "@/db/memberships";
import { listOutboxMessages } from "@/db/outbox";
import { latestRoundStates } from "@/db/reviews";
import { bodyOf, call } from "./support/http";
import { useMailSink } from "./support/mail";
import { newUser, teamWorkspace, type TestUser } from "./support/users";
import { editLive, params, saveVersion, setMass, vanDocument, type Team } from "./versions-support";

useMailSink();

let team: Team;
let second: TestUser;
beforeAll(async () => {
  team = await teamWorkspace();
  second = await newUser("reviewer");
  await addMembership({ workspaceId: team.workspaceId, userId: second.id, role: "reviewer" });
});

async function twoVersions() {
  const documentId = await vanDocument(team);
  const v1 = (await saveVersion(team, documentId, team.editor, "Empty van")).body.version;
  await editLive(documentId, setMass("2100 kg"));
  const v2 = (await saveVersion(team, documentId, team.editor, "Loaded van")).body.version;
  return { documentId, v1, v2 };
}

async function request(by: TestUser, documentId: string, body: unknown) {
  const res = await call(reviewsRoute.POST, "POST", "/", { cookie: by.cookie, params: params(team, documentId), body });
  return { status: res.status, body: await bodyOf(res) };
}

async function verdict(by: TestUser, documentId: string, roundId: string, body: unknown) {
  const res = await call(verdictRoute.POST, "POST", "/", { cookie: by.cookie, params: params(team, documentId, { roundId }), body });
  return { status: res.status, body: await bodyOf(res) };
}

const mailsTo = async (u: TestUser) => (await listOutboxMessages({ limit: 500 })).filter((m) => m.to.includes(u.email));

describe("review rounds", () => {
  it("request → e-mail with a diff link → changes requested → e-mail to the editor; state shows for the documents table", async () => {
    const { documentId, v1, v2 } = await twoVersions();
    const r = await request(team.editor, documentId, { versionId: v2.id, reviewerIds: [team.reviewer.id, second.id], message: "mass update" });
    expect(r.status).toBe(201);
    expect(r.body.round).toMatchObject({ state: "open", version: { id: v2.id, number: 2 }, previousVersionId: v1.id, requestedBy: { id: team.editor.id } });
    expect(r.body.round.reviewers.map((x: { verdict: null }) => x.verdict)).toEqual([null, null]);
    const [invite] = await mailsTo(team.reviewer);
    expect(invite!.subject).toMatch(/Review requested/);
    expect(invite!.text).toContain(`/w/${team.workspaceId}/documents/${documentId}/diff?from=${v1.id}&to=${v2.id}&round=${r.body.round.id}`);
    expect(invite!.text).toContain("mass update");

    const roundId = r.body.round.id;
    const noComment = await verdict(team.reviewer, documentId, roundId, { verdict: "changes_requested" });
    expect(noComment.status).toBe(422);
    expect(noComment.body.fields.comment).toMatch(/which changes/);
    const changes = await verdict(team.reviewer, documentId, roundId, { verdict: "changes_requested", comment: "rolling resistance is optimistic" });
    expect(changes.status).toBe(200);
    expect(changes.body.round.state).toBe("changes_requested");
    const approve = await verdict(second, documentId, roundId, { verdict: "approve" });
    expect(approve.body.round.state).toBe("changes_requested"); // any request for changes wins
    const toEditor = await mailsTo(team.editor);
    expect(toEditor.some((m) => /requested changes/.test(m.subject) && m.text.includes("rolling resistance is optimistic"))).toBe(true);
    expect(toEditor.some((m) => m.text.includes(`/documents/${documentId}/reviews#round-${roundId}`))).toBe(true);
    const states = await latestRoundStates({ documentIds: [documentId] });
    expect(states.get(documentId)).toMatchObject({ state: "changes_requested", versionNumber: 2 });
    const table = await bodyOf(await call(documentsRoute.GET, "GET", "/", { cookie: team.viewer.cookie, params: { workspaceId: team.workspaceId } }));
    expect(table.documents.find((d: { id: string }) => d.id === documentId).review).toEqual({ state: "changes_requested", versionNumber: 2 });

    // the reviewer changes their mind: every reviewer approves → approved
    const later = await verdict(team.reviewer, documentId, roundId, { verdict: "approve", comment: "fixed in the data sheet" });
    expect(later.body.round.state).toBe("approved");
    const list = await bodyOf(await call(reviewsRoute.GET, "GET", "/", { cookie: team.viewer.cookie, params: params(team, documentId) }));
    expect(list.rounds[0]).toMatchObject({ id: roundId, state: "approved" });
  });

  it("only editors and owners ask; only named reviewers and owners/reviewers give verdicts", async () => {
    const { documentId, v2 } = await twoVersions();
    for (const who of [team.reviewer, team.viewer]) {
      expect((await request(who, documentId, { versionId: v2.id, reviewerIds: [second.id] })).status).toBe(403);
    }
    expect((await request(team.outsider, documentId, { versionId: v2.id, reviewerIds: [second.id] })).status).toBe(404);
    const bad = await request(team.editor, documentId, { versionId: v2.id, reviewerIds: [team.viewer.id, team.outsider.id, team.editor.id] });
    expect(bad.status).toBe(422);
    expect(bad.body.fields["reviewerIds.0"]).toMatch(/viewer and cannot give verdicts/);
    expect(bad.body.fields["reviewerIds.1"]).toMatch(/not a member/);
    expect(bad.body.fields["reviewerIds.2"]).toMatch(/own request/);
    const round = (await request(team.editor, documentId, { versionId: v2.id, reviewerIds: [second.id] })).body.round;
    // the owner may give verdicts in general, but is not a reviewer of this round
    expect((await verdict(team.owner, documentId, round.id, { verdict: "approve" })).status).toBe(403);
    expect((await verdict(team.editor, documentId, round.id, { verdict: "approve" })).status).toBe(403);
    expect((await verdict(team.viewer, documentId, round.id, { verdict: "approve" })).status).toBe(403);
    expect((await verdict(second, documentId, "00000000-0000-4000-8000-000000000000", { verdict: "approve" })).status).toBe(404);
  });

  it("no review-request e-mail when the reviewer switched them off", async () => {
    const quiet = await newUser("quiet");
    await addMembership({ workspaceId: team.workspaceId, userId: quiet.id, role: "reviewer" });
    const { saveNotificationSettings } = await import("@/db/notifications");
    await saveNotificationSettings({ userId: quiet.id, settings: { reviewRequests: false, mentions: true, verdicts: true } });
    const { documentId, v2 } = await twoVersions();
    expect((await request(team.editor, documentId, { versionId: v2.id, reviewerIds: [quiet.id] })).status).toBe(201);
    expect(await mailsTo(quiet)).toHaveLength(0);
  });
});
