// Sign-up, sign-in, sign-out, sessions and sign-in throttling through the route handlers.
import { count, eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import * as signInRoute from "@/app/api/auth/sign-in/route";
import * as signOutRoute from "@/app/api/auth/sign-out/route";
import * as signUpRoute from "@/app/api/auth/sign-up/route";
import * as meRoute from "@/app/api/me/route";
import * as passwordRoute from "@/app/api/me/password/route";
import { getDb } from "@/db/pool";
import { sessions, signInAttempts, users } from "@/db/schema";
import { bodyOf, call, sessionCookie } from "./support/http";
import { newUser, PASSWORD } from "./support/users";

const userCount = async () => (await getDb().select({ n: count() }).from(users))[0]!.n;
const signIn = (email: string, password: string, ip = "198.51.100.7") =>
  call(signInRoute.POST, "POST", "/api/auth/sign-in", { body: { email, password }, ip });

describe("sign-up", () => {
  it("creates the account, lower-cases the e-mail and sets an HttpOnly SameSite=Lax session cookie", async () => {
    const res = await call(signUpRoute.POST, "POST", "/api/auth/sign-up", {
      body: { email: "  Marta.Quist@Example.COM ", name: "Marta Quist", password: PASSWORD },
    });
    expect(res.status).toBe(201);
    expect((await bodyOf(res)).user).toMatchObject({ email: "marta.quist@example.com", name: "Marta Quist" });
    const setCookie = res.headers.getSetCookie().join("\n");
    expect(setCookie).toMatch(/joulebook_session=[^;]+/);
    expect(setCookie).toMatch(/HttpOnly/i);
    expect(setCookie).toMatch(/SameSite=Lax/i);
    expect(setCookie).toMatch(/Path=\//);
    expect(setCookie).not.toMatch(/Secure/i); // APP_URL is not https in tests
    const [row] = await getDb().select().from(users).where(eq(users.email, "marta.quist@example.com"));
    expect(row!.passwordHash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
  });

  it("refuses a duplicate e-mail (any case) with 409 and writes nothing", async () => {
    const u = await newUser("dup");
    const before = await userCount();
    const res = await call(signUpRoute.POST, "POST", "/api/auth/sign-up", {
      body: { email: u.email.toUpperCase(), name: "Someone else", password: PASSWORD },
    });
    expect(res.status).toBe(409);
    expect((await bodyOf(res)).error).toMatch(/already exists/);
    expect(sessionCookie(res)).toBeNull();
    expect(await userCount()).toBe(before);
  });

  it.each([
    ["too short", "short pw", /at least 10 characters/],
    ["the e-mail address itself", "weakling@example.com", /must not be your e-mail/],
  ])("refuses a weak password (%s) with 422 and a field message", async (_label, password, message) => {
    const before = await userCount();
    const res = await call(signUpRoute.POST, "POST", "/api/auth/sign-up", { body: { email: "weakling@example.com", name: "W", password } });
    expect(res.status).toBe(422);
    expect((await bodyOf(res)).fields.password).toMatch(message);
    expect(await userCount()).toBe(before);
  });

  it("names every invalid field", async () => {
    const res = await call(signUpRoute.POST, "POST", "/api/auth/sign-up", { body: { email: "not-an-address", name: "", password: 12 } });
    expect(res.status).toBe(422);
    const { fields } = await bodyOf(res);
    expect(fields.email).toMatch(/valid e-mail/);
    expect(fields.name).toMatch(/enter a name/);
    expect(fields.password).toBeTruthy();
  });
});

describe("sign-in and sign-out", () => {
  it("signs in with the right password, in any e-mail case", async () => {
    const u = await newUser("signin");
    const res = await signIn(u.email.toUpperCase(), PASSWORD);
    expect(res.status).toBe(200);
    const cookie = sessionCookie(res);
    const me = await call(meRoute.GET, "GET", "/api/me", { cookie });
    expect((await bodyOf(me)).user.id).toBe(u.id);
  });

  it("signing in again ends the session the browser already had", async () => {
    const u = await newUser("again");
    const res = await call(signInRoute.POST, "POST", "/api/auth/sign-in", { body: { email: u.email, password: PASSWORD }, cookie: u.cookie });
    expect(res.status).toBe(200);
    expect((await call(meRoute.GET, "GET", "/api/me", { cookie: u.cookie })).status).toBe(401);
    expect((await call(meRoute.GET, "GET", "/api/me", { cookie: sessionCookie(res) })).status).toBe(200);
  });

  it("answers a wrong password and an unknown account the same way (401)", async () => {
    const u = await newUser("wrong");
    const a = await signIn(u.email, "not the password");
    const b = await signIn("nobody-here@example.com", "not the password");
    expect(a.status).toBe(401);
    expect(b.status).toBe(401);
    expect((await bodyOf(a)).error).toBe((await bodyOf(b)).error);
    expect(sessionCookie(a)).toBeNull();
  });

  it("sign-out ends the session in the database and clears the cookie", async () => {
    const u = await newUser("out");
    const res = await call(signOutRoute.POST, "POST", "/api/auth/sign-out", { cookie: u.cookie });
    expect(res.status).toBe(204);
    expect(res.headers.getSetCookie().join()).toMatch(/joulebook_session=;.*Max-Age=0/i);
    expect((await call(meRoute.GET, "GET", "/api/me", { cookie: u.cookie })).status).toBe(401);
    const left = await getDb().select({ n: count() }).from(sessions).where(eq(sessions.userId, u.id));
    expect(left[0]!.n).toBe(0);
  });

  it("signed out, /api/me is 401 with the contract's message", async () => {
    const res = await call(meRoute.GET, "GET", "/api/me");
    expect(res.status).toBe(401);
    expect(await bodyOf(res)).toEqual({ error: "sign in first" });
  });

  it("renews a session in the second half of its life (lucia's fresh flag)", async () => {
    const u = await newUser("renew");
    const soon = new Date(Date.now() + 2 * 24 * 3600 * 1000);
    await getDb().update(sessions).set({ expiresAt: soon }).where(eq(sessions.userId, u.id));
    const res = await call(meRoute.GET, "GET", "/api/me", { cookie: u.cookie });
    expect(res.status).toBe(200);
    expect(res.headers.getSetCookie().join()).toMatch(/joulebook_session=[^;]+;/);
    const [row] = await getDb().select().from(sessions).where(eq(sessions.userId, u.id));
    expect(row!.expiresAt.getTime()).toBeGreaterThan(Date.now() + 29 * 24 * 3600 * 1000);
  });

  it("changing the password ends the other sessions and keeps this browser signed in", async () => {
    const u = await newUser("chpw");
    const other = sessionCookie(await signIn(u.email, PASSWORD));
    const wrong = await call(passwordRoute.POST, "POST", "/api/me/password", {
      cookie: u.cookie, body: { currentPassword: "not it at all", newPassword: "a brand new passphrase" },
    });
    expect(wrong.status).toBe(422);
    expect((await bodyOf(wrong)).fields.currentPassword).toMatch(/wrong/);
    const res = await call(passwordRoute.POST, "POST", "/api/me/password", {
      cookie: u.cookie, body: { currentPassword: PASSWORD, newPassword: "a brand new passphrase" },
    });
    expect(res.status).toBe(204);
    const fresh = sessionCookie(res);
    expect((await call(meRoute.GET, "GET", "/api/me", { cookie: other })).status).toBe(401);
    expect((await call(meRoute.GET, "GET", "/api/me", { cookie: fresh })).status).toBe(200);
    expect((await signIn(u.email, "a brand new passphrase")).status).toBe(200);
  });

  it("PATCH /api/me renames the account", async () => {
    const u = await newUser("rename");
    const res = await call(meRoute.PATCH, "PATCH", "/api/me", { cookie: u.cookie, body: { name: "  Renamed Person " } });
    expect(res.status).toBe(200);
    expect((await bodyOf(res)).user.name).toBe("Renamed Person");
  });
});

describe("sign-in throttling (state in PostgreSQL)", () => {
  it("locks an account after 5 failures in 15 minutes, even for the right password, with Retry-After", async () => {
    const u = await newUser("lock");
    for (let i = 0; i < 5; i++) expect((await signIn(u.email, `wrong ${i}`, `203.0.113.${i}`)).status).toBe(401);
    const res = await signIn(u.email, PASSWORD, "203.0.113.99");
    expect(res.status).toBe(429);
    const retry = Number(res.headers.get("retry-after"));
    expect(retry).toBeGreaterThan(14 * 60);
    expect(retry).toBeLessThanOrEqual(15 * 60);
    expect((await bodyOf(res)).error).toMatch(/this account/);
    // Another account from the same address is not affected.
    const v = await newUser("notlocked");
    expect((await signIn(v.email, PASSWORD, "203.0.113.99")).status).toBe(200);
  });

  it("lets the account in again once the failures are older than the window", async () => {
    const u = await newUser("aged");
    for (let i = 0; i < 5; i++) await signIn(u.email, `wrong ${i}`, "203.0.113.50");
    expect((await signIn(u.email, PASSWORD, "203.0.113.51")).status).toBe(429);
    await getDb().update(signInAttempts).set({ attemptedAt: sql`now() - interval '16 minutes'` }).where(eq(signInAttempts.key, u.email));
    expect((await signIn(u.email, PASSWORD, "203.0.113.51")).status).toBe(200);
  });

  it("a successful sign-in forgives earlier failures of the account", async () => {
    const u = await newUser("forgive");
    for (let i = 0; i < 4; i++) await signIn(u.email, `wrong ${i}`, "203.0.113.60");
    expect((await signIn(u.email, PASSWORD, "203.0.113.60")).status).toBe(200);
    for (let i = 0; i < 4; i++) expect((await signIn(u.email, `again ${i}`, "203.0.113.61")).status).toBe(401);
    expect((await signIn(u.email, PASSWORD, "203.0.113.61")).status).toBe(200);
  });

  it("locks a client address after 20 failures across accounts; other addresses still work", async () => {
    const ip = "192.0.2.44";
    for (let i = 0; i < 20; i++) expect((await signIn(`spray${i}@example.com`, "guess guess", ip)).status).toBe(401);
    const u = await newUser("victim");
    const res = await signIn(u.email, PASSWORD, ip);
    expect(res.status).toBe(429);
    expect(res.headers.get("retry-after")).toMatch(/^\d+$/);
    expect((await bodyOf(res)).error).toMatch(/your network/);
    expect((await signIn(u.email, PASSWORD, "192.0.2.45")).status).toBe(200);
  });
});
