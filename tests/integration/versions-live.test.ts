// Restore while people are connected: the forward update must reach open clients through the
// collaboration server (server/collab/inject.ts), not only PostgreSQL.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as restoreRoute from "@/app/api/workspaces/[workspaceId]/documents/[documentId]/versions/[versionId]/restore/route";
import { readBlocks, readDoc, setParam } from "@/lib/notebook";
import { startCollabServer, type CollabServer } from "@/server/collab/server";
import { connectClient, waitFor, whenSynced, type CollabClient } from "./support/collab";
import { APP, bodyOf, call } from "./support/http";
import { teamWorkspace } from "./support/users";
import { params, saveVersion, vanDocument, type Team } from "./versions-support";

let server: CollabServer;
let team: Team;
const open: CollabClient[] = [];

beforeAll(async () => {
  server = await startCollabServer({ port: 0, appUrl: APP, touchInterval_ms: 0 });
  process.env.COLLAB_URL = `ws://127.0.0.1:${server.port}`;
  team = await teamWorkspace();
});

afterAll(async () => {
  for (const c of open) c.close();
  await server.close();
  delete process.env.COLLAB_URL;
});

async function client(documentId: string, cookie: string): Promise<CollabClient> {
  const c = connectClient({ url: `ws://127.0.0.1:${server.port}`, documentId, cookie });
  open.push(c);
  await whenSynced(c);
  return c;
}

const massOf = (c: CollabClient) => readBlocks(c.doc).find((b) => b.kind === "body")?.params.mass;

describe("restore with connected clients", () => {
  it("an editor's and a viewer's open documents receive the restore at once", async () => {
    const documentId = await vanDocument(team);
    const v1 = (await saveVersion(team, documentId, team.editor, "v1")).body.version;
    const editor = await client(documentId, team.editor.cookie);
    const viewer = await client(documentId, team.viewer.cookie);
    const body = readBlocks(editor.doc).find((b) => b.kind === "body")!.id;
    setParam(editor.doc, body, "mass", "2100 kg");
    await waitFor(viewer.doc, () => massOf(viewer) === "2100 kg", "the viewer to see the edit");
    // the collaboration server persists before relaying, so the edit is in PostgreSQL now
    const res = await call(restoreRoute.POST, "POST", "/", { cookie: team.editor.cookie, params: params(team, documentId, { versionId: v1.id }) });
    expect(await bodyOf(res)).toEqual({ changed: true, deliveredLive: true });
    await waitFor(editor.doc, () => massOf(editor) === "curb_mass + payload", "the editor to receive the restore");
    await waitFor(viewer.doc, () => massOf(viewer) === "curb_mass + payload", "the viewer to receive the restore");
    expect(readDoc(viewer.doc)).toEqual(readDoc(editor.doc));
  });

  it("the loopback endpoint refuses a request without the shared secret", async () => {
    const documentId = await vanDocument(team);
    const res = await fetch(`http://127.0.0.1:${server.port}/internal/documents/${documentId}/update`, {
      method: "POST", headers: { authorization: "Bearer guess" }, body: new Uint8Array([0, 0]),
    });
    expect(res.status).toBe(401);
  });
});
