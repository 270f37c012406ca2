// How the notebook reads a connection the collaboration server ended. Codes and statuses from
// server/collab/server.ts and admission.ts (4400 + HTTP status: 4401 session ended, 4403, 4404
// membership or document gone; upgrade refusals 401/403/404), and RFC 6455 §7.4 (1006: closed
// without a close frame, which is all a browser sees of a refused upgrade).
import { describe, expect, test } from "vitest";
import * as Y from "yjs";
import { ObservableV2 } from "lib0/observable";
import type { WebsocketProvider } from "y-websocket";
import { endedByCloseCode, endedByHttpStatus, ENDED_MESSAGES } from "@/lib/client/notebook/connection-end";
import { watchConnection, type ConnectionStatus } from "@/lib/client/notebook/connection-watch";

describe("close code → state", () => {
  test.each([
    [4401, "session-ended"],
    [4403, "no-access"],
    [4404, "no-access"],
    [4400, "closed"], // any other 44xx is final for y-websocket: a generic message, no guess
    [4499, "closed"],
    [1000, null], [1001, null], [1006, null], [1011, null], // transient: y-websocket reconnects
    [4500, null], // 45xx is y-websocket's "try again later" range
  ])("%i → %s", (code, state) => {
    expect(endedByCloseCode(code)).toBe(state);
  });

  test.each([[401, "session-ended"], [403, "no-access"], [404, "no-access"], [200, null], [500, null], [502, null]])("HTTP %i → %s", (status, state) => {
    expect(endedByHttpStatus(status)).toBe(state);
  });

  test("the messages the product promises", () => {
    expect(ENDED_MESSAGES["session-ended"]).toBe("Your session ended — sign in again");
    expect(ENDED_MESSAGES["no-access"]).toBe("You no longer have access to this document");
  });
});

type Events = {
  status: (e: { status: string }) => void;
  "connection-close": (e: CloseEvent | null) => void;
  closed: (e: { code: number; reason: string }) => void;
  sync: (s: boolean) => void;
};

/** Just the provider surface the watcher uses; events fired in y-websocket's order. */
class FakeProvider extends ObservableV2<Events> {
  wsconnected = false;
  synced = false;
  shouldConnect = true;
  disconnects = 0;
  disconnect() { this.disconnects++; this.shouldConnect = false; this.wsconnected = false; }
  connect() { this.shouldConnect = true; }
  open() { this.wsconnected = true; this.emit("status", [{ status: "connected" }]); this.synced = true; this.emit("sync", [true]); }
  serverClose(code: number) {
    const opened = this.wsconnected;
    this.wsconnected = false; this.synced = false;
    this.emit("connection-close", [{ code, reason: "" } as CloseEvent]);
    if (opened) this.emit("status", [{ status: "disconnected" }]);
    if (code >= 4400 && code < 4500) this.emit("closed", [{ code, reason: "" }]);
  }
}

function setup(probeStatus: number | null) {
  const provider = new FakeProvider();
  const doc = new Y.Doc();
  const states: ConnectionStatus[] = [];
  let probes = 0;
  const watch = watchConnection(provider as unknown as WebsocketProvider, doc, {
    probe: async () => { probes++; return probeStatus; },
    onChange: (s) => states.push(s),
    probeInterval_ms: 0,
  });
  const last = () => states.at(-1)!.connection;
  return { provider, doc, watch, last, unsynced: () => states.at(-1)!.unsynced, probes: () => probes };
}

const settle = () => new Promise((r) => setTimeout(r, 0));

describe("watchConnection", () => {
  test("4401 on an open connection: session ended, no probe, no reconnect", async () => {
    const s = setup(200);
    s.provider.open();
    expect(s.last()).toBe("connected");
    s.provider.serverClose(4401);
    await settle();
    expect(s.last()).toBe("session-ended");
    expect(s.probes()).toBe(0);
    expect(s.provider.shouldConnect).toBe(false);
  });

  test("4404: no access", async () => {
    const s = setup(200);
    s.provider.open();
    s.provider.serverClose(4404);
    expect(s.last()).toBe("no-access");
  });

  test("a refused upgrade (1006, never opened) asks the app: 401 → session ended and attempts stop", async () => {
    const s = setup(401);
    s.provider.serverClose(1006);
    await settle();
    expect(s.probes()).toBe(1);
    expect(s.last()).toBe("session-ended");
    expect(s.provider.shouldConnect).toBe(false);
  });

  test("a refused upgrade the app answers with 404 → no access", async () => {
    const s = setup(404);
    s.provider.serverClose(1006);
    await settle();
    expect(s.last()).toBe("no-access");
  });

  test("server down but the app says the document is readable: keep reconnecting", async () => {
    const s = setup(200);
    s.provider.open();
    s.provider.serverClose(1006); // lost after being open: no probe, just reconnecting
    await settle();
    expect(s.probes()).toBe(0);
    expect(s.last()).toBe("reconnecting");
    s.provider.serverClose(1006); // the next attempt fails before opening
    await settle();
    expect(s.probes()).toBe(1);
    expect(s.last()).toBe("reconnecting");
    expect(s.provider.shouldConnect).toBe(true);
  });

  test("no answer from the app (network): not an ending", async () => {
    const s = setup(null);
    s.provider.serverClose(1006);
    await settle();
    expect(s.last()).toBe("connecting");
    expect(s.provider.shouldConnect).toBe(true);
  });

  test("edits after the end are reported unsaved, and coming online does not reconnect", async () => {
    const s = setup(200);
    s.provider.open();
    s.provider.serverClose(4401);
    expect(s.unsynced()).toBe(false);
    s.doc.getText("t").insert(0, "x");
    expect(s.last()).toBe("session-ended");
    expect(s.unsynced()).toBe(true);
    s.watch.online();
    expect(s.provider.disconnects).toBe(0);
    expect(s.provider.shouldConnect).toBe(false);
  });
});
