// The route-handler wrapper: Origin check, JSON only, size cap, zod 422, error mapping.
import { count } from "drizzle-orm";
import { describe, expect, it, vi } from "vitest";
import * as signUpRoute from "@/app/api/auth/sign-up/route";
import * as workspaceRoute from "@/app/api/workspaces/[workspaceId]/route";
import * as workspacesRoute from "@/app/api/workspaces/route";
import { getDb } from "@/db/pool";
import { users, workspaces } from "@/db/schema";
import { route } from "@/lib/http/route";
import { bodyOf, call } from "./support/http";
import { newUser, PASSWORD } from "./support/users";

const n = async (table: typeof users | typeof workspaces) => (await getDb().select({ n: count() }).from(table))[0]!.n;
const signUpBody = { email: "guard@example.com", name: "Guard", password: PASSWORD };

describe("cross-origin requests", () => {
  it("refuses a POST from another origin with 403 and writes nothing", async () => {
    const u = await newUser("csrf");
    const before = await n(workspaces);
    const res = await call(workspacesRoute.POST, "POST", "/api/workspaces", { body: { name: "Evil" }, cookie: u.cookie, origin: "https://evil.example" });
    expect(res.status).toBe(403);
    expect(await bodyOf(res)).toEqual({ error: "cross-origin request refused" });
    expect(await n(workspaces)).toBe(before);
  });

  it("refuses a look-alike origin (same host name, other port) and a missing Origin", async () => {
    const before = await n(users);
    const otherPort = await call(signUpRoute.POST, "POST", "/api/auth/sign-up", { body: signUpBody, origin: "http://127.0.0.1:9999" });
    expect(otherPort.status).toBe(403);
    const none = await call(signUpRoute.POST, "POST", "/api/auth/sign-up", { body: signUpBody, origin: null });
    expect(none.status).toBe(403);
    const garbage = await call(signUpRoute.POST, "POST", "/api/auth/sign-up", { body: signUpBody, origin: "null" });
    expect(garbage.status).toBe(403);
    expect(await n(users)).toBe(before);
  });

  it("accepts a request without Origin when the browser marks it same-origin", async () => {
    const res = await call(signUpRoute.POST, "POST", "/api/auth/sign-up", {
      body: { ...signUpBody, email: "fetchsite@example.com" }, origin: null, headers: { "sec-fetch-site": "same-origin" },
    });
    expect(res.status).toBe(201);
  });
});

describe("request bodies", () => {
  it("refuses a form-encoded body with 415 and writes nothing", async () => {
    const before = await n(users);
    const res = await call(signUpRoute.POST, "POST", "/api/auth/sign-up", {
      rawBody: "email=a%40example.com&name=A&password=xxxxxxxxxxxx", headers: { "content-type": "application/x-www-form-urlencoded" },
    });
    expect(res.status).toBe(415);
    expect((await bodyOf(res)).error).toMatch(/JSON/);
    expect(await n(users)).toBe(before);
  });

  it("refuses a body over 64 KiB with 413 (declared length and streamed body alike)", async () => {
    const big = JSON.stringify({ ...signUpBody, name: "x".repeat(70 * 1024) });
    const res = await call(signUpRoute.POST, "POST", "/api/auth/sign-up", { rawBody: big, headers: { "content-type": "application/json" } });
    expect(res.status).toBe(413);
    const stream = new ReadableStream<Uint8Array>({
      start(c) {
        for (let i = 0; i < 10; i++) c.enqueue(new TextEncoder().encode(" ".repeat(8 * 1024)));
        c.close();
      },
    });
    const chunked = new Request("http://127.0.0.1:3210/api/auth/sign-up", {
      method: "POST", body: stream, duplex: "half",
      headers: { host: "127.0.0.1:3210", origin: "http://127.0.0.1:3210", "content-type": "application/json" },
    } as RequestInit);
    expect((await signUpRoute.POST(chunked, { params: Promise.resolve({}) })).status).toBe(413);
  });

  it("answers malformed JSON with 400", async () => {
    const res = await call(signUpRoute.POST, "POST", "/api/auth/sign-up", { rawBody: "{not json", headers: { "content-type": "application/json" } });
    expect(res.status).toBe(400);
    expect((await bodyOf(res)).error).toMatch(/not valid JSON/);
  });

  it("answers a schema failure with 422 and one message per field", async () => {
    const u = await newUser("fields");
    const res = await call(workspacesRoute.POST, "POST", "/api/workspaces", { body: { name: "   " }, cookie: u.cookie });
    expect(res.status).toBe(422);
    expect(await bodyOf(res)).toEqual({ error: "some fields are not valid", fields: { name: "enter a workspace name" } });
    const notObject = await call(workspacesRoute.POST, "POST", "/api/workspaces", { body: [1, 2], cookie: u.cookie });
    expect(notObject.status).toBe(422);
  });
});

describe("errors", () => {
  it("turns an unknown error into a generic 500 and logs it server-side, never sending its message", async () => {
    const log = vi.spyOn(console, "error").mockImplementation(() => {});
    const handler = route({}, async () => {
      throw new Error('relation "secret_table" does not exist');
    });
    const res = await handler(new Request("http://127.0.0.1:3210/api/x"), { params: Promise.resolve({}) });
    expect(res.status).toBe(500);
    const text = await res.text();
    expect(text).not.toMatch(/secret_table|relation/);
    expect(JSON.parse(text).error).toMatch(/went wrong/);
    expect(log).toHaveBeenCalled();
    log.mockRestore();
  });

  it("a workspace id that is not a UUID is a 404, not a database error", async () => {
    const u = await newUser("baduuid");
    const res = await call(workspaceRoute.GET, "GET", "/api/workspaces/x", { cookie: u.cookie, params: { workspaceId: "'; drop table users; --" } });
    expect(res.status).toBe(404);
  });
});
