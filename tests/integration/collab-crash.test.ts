// The collaboration server as its own process (server/collab.ts), killed with SIGKILL in the middle
// of a stream of edits and started again: every update that a second client had received must be
// in PostgreSQL (issue 5: "every update is appended to PostgreSQL before it is relayed"), and the
// writer's unacknowledged edits arrive after the restart through its sync step 2.
import { spawn, type ChildProcess } from "node:child_process";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as Y from "yjs";
import { createDocumentFromDoc, loadDocumentState } from "@/db/document-updates";
import { createScenarioDoc } from "@/lib/notebook";
import { connectClient, freePort, waitFor, whenSynced, type CollabClient } from "./support/collab";
import { APP } from "./support/http";
import { teamWorkspace } from "./support/users";

let port: number;
let child: ChildProcess | undefined;
const clients: CollabClient[] = [];

async function startChild(): Promise<ChildProcess> {
  const proc = spawn(process.execPath, ["--import", "tsx", "server/collab.ts"], {
    env: { ...process.env, COLLAB_PORT: String(port), APP_URL: APP },
    stdio: ["ignore", "ignore", "pipe"],
  });
  let stderr = "";
  proc.stderr!.on("data", (c: Buffer) => (stderr += c.toString()));
  const deadline = Date.now() + 20_000;
  for (;;) {
    if (proc.exitCode !== null) throw new Error(`collab server exited: ${stderr}`);
    const ok = await fetch(`http://127.0.0.1:${port}/health`).then((r) => r.ok, () => false);
    if (ok) return proc;
    if (Date.now() > deadline) throw new Error(`collab server did not start: ${stderr}`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

function killed(proc: ChildProcess): Promise<void> {
  return new Promise((resolve) => {
    if (proc.exitCode !== null || proc.signalCode !== null) return resolve();
    proc.once("exit", () => resolve());
    proc.kill("SIGKILL");
  });
}

beforeAll(async () => {
  port = await freePort();
});

afterAll(async () => {
  for (const c of clients) c.close();
  if (child) await killed(child);
});

describe("collaboration server killed mid-edit", () => {
  it("loses no update that it had relayed, and takes the rest after the restart", async () => {
    const team = await teamWorkspace();
    const template = createScenarioDoc("parallel", "Crash test");
    const { id } = await createDocumentFromDoc({ workspaceId: team.workspaceId, name: "Crash test", powertrain: "parallel", createdBy: team.owner.id, ydoc: template });
    child = await startChild();
    const url = `ws://127.0.0.1:${port}`;
    const writer = connectClient({ url, documentId: id, cookie: team.editor.cookie });
    const observer = connectClient({ url, documentId: id, cookie: team.viewer.cookie });
    clients.push(writer, observer);
    await Promise.all([whenSynced(writer), whenSynced(observer)]);

    // The writer appends numbered entries without pause; the observer records what reached it.
    const written = writer.doc.getArray<number>("log");
    let n = 0;
    let writing = true;
    const pump = (async () => {
      while (writing && n < 100_000) {
        written.push([n++]);
        if (n % 5 === 0) await new Promise((r) => setImmediate(r));
      }
    })();
    await waitFor(observer.doc, (d) => d.getArray("log").length >= 300, "300 relayed entries");
    // Kill while edits are still flowing, then stop the observer from hearing anything more.
    const dead = killed(child);
    await dead;
    writing = false;
    await pump;
    const relayed = observer.doc.getArray<number>("log").toArray();
    observer.provider.disconnect();
    expect(relayed.length).toBeGreaterThanOrEqual(300);
    expect(n).toBeGreaterThan(relayed.length); // the kill really came in the middle of the stream

    const afterCrash = new Y.Doc();
    Y.applyUpdate(afterCrash, await loadDocumentState({ documentId: id }));
    const stored = new Set(afterCrash.getArray<number>("log").toArray());
    const missing = relayed.filter((v) => !stored.has(v));
    expect(missing).toEqual([]);

    // Restart: the writer's provider reconnects by itself and sends what the server never stored.
    child = await startChild();
    await whenSynced(writer, 20_000);
    const fresh = connectClient({ url, documentId: id, cookie: team.owner.cookie });
    clients.push(fresh);
    await whenSynced(fresh);
    await waitFor(fresh.doc, (d) => d.getArray("log").length === n, `all ${n} entries after the restart`, 20_000);
    const all = fresh.doc.getArray<number>("log").toArray();
    expect(new Set(all).size).toBe(n);
  }, 60_000);
});
