// Shared by the versions, comments and reviews integration tests: a workspace with one user per
// role, a van document stored in PostgreSQL, and calls to our route handlers.
import * as Y from "yjs";
import * as versionsRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/versions/route";
import { appendDocumentChange, createDocumentFromDoc } from "@/db/document-updates";
import { createScenarioDoc, readBlocks, setParam } from "@/lib/notebook";
import { bodyOf, call } from "./support/http";
import { teamWorkspace, type TestUser } from "./support/users";

export type Team = Awaited<ReturnType<typeof teamWorkspace>>;

/** A conventional van at 1500 kg (template kerb mass 1420 kg + 80 kg payload, lib/notebook/templates.ts). */
export async function vanDocument(team: Team, name = "Delivery van"): Promise<string> {
  const ydoc = createScenarioDoc("conventional", name);
  const row = await createDocumentFromDoc({ workspaceId: team.workspaceId, name, powertrain: "conventional", createdBy: team.owner.id, ydoc });
  ydoc.destroy();
  return row.id;
}

/** Changes the stored live document the way an edit through the collaboration server would. */
export async function editLive(documentId: string, change: (doc: Y.Doc) => void): Promise<void> {
  await appendDocumentChange({ documentId, change });
}

export function setMass(text: string) {
  return (doc: Y.Doc) => setParam(doc, readBlocks(doc).find((b) => b.kind === "body")!.id, "mass", text);
}

export async function saveVersion(team: Team, documentId: string, by: TestUser, name: string, message = ""): Promise<{ status: number; body: any }> {
  const res = await call(versionsRoute.POST, "POST", "/", { cookie: by.cookie, params: { workspaceId: team.workspaceId, documentId }, body: { name, message } });
  return { status: res.status, body: await bodyOf(res) };
}

export function params(team: Team, documentId: string, extra: Record<string, string> = {}) {
  return { workspaceId: team.workspaceId, documentId, ...extra };
}
