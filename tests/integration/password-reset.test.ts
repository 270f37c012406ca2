// Password reset by e-mailed single-use link, read back from the outbox like a person would.
import { eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import * as confirmRoute from "@/app/api/auth/password-reset/confirm/route";
import * as requestRoute from "@/app/api/auth/password-reset/route";
import * as signInRoute from "@/app/api/auth/sign-in/route";
import * as meRoute from "@/app/api/me/route";
import { listOutboxMessages } from "@/db/outbox";
import { getDb } from "@/db/pool";
import { passwordResetTokens } from "@/db/schema";
import { hashToken } from "@/lib/auth/tokens";
import { bodyOf, call } from "./support/http";
import { lastMailTo, linkToken, useMailSink } from "./support/mail";
import { newUser, PASSWORD } from "./support/users";

useMailSink();

const NEW_PASSWORD = "fresh reset passphrase";
const requestReset = (email: string) => call(requestRoute.POST, "POST", "/api/auth/password-reset", { body: { email } });
const confirm = (token: string, password = NEW_PASSWORD) =>
  call(confirmRoute.POST, "POST", "/api/auth/password-reset/confirm", { body: { token, password } });
const signIn = (email: string, password: string) => call(signInRoute.POST, "POST", "/api/auth/sign-in", { body: { email, password } });

async function mailedToken(email: string): Promise<string> {
  expect((await requestReset(email)).status).toBe(202);
  return linkToken((await lastMailTo(email)).text, "/reset-password?token=");
}

describe("password reset", () => {
  it("mails a link; using it sets the password, ends every session, and stores only a hash", async () => {
    const u = await newUser("reset");
    const token = await mailedToken(u.email);
    const mail = await lastMailTo(u.email);
    expect(mail.subject).toMatch(/new Joulebook password/);
    expect(mail.html).toContain(`/reset-password?token=${token}`);
    const rows = await getDb().select().from(passwordResetTokens);
    expect(rows.map((r) => r.tokenHash)).toContain(hashToken(token));
    expect(JSON.stringify(rows)).not.toContain(token);

    expect((await confirm(token)).status).toBe(204);
    expect((await call(meRoute.GET, "GET", "/api/me", { cookie: u.cookie })).status).toBe(401);
    expect((await signIn(u.email, PASSWORD)).status).toBe(401);
    expect((await signIn(u.email, NEW_PASSWORD)).status).toBe(200);
  });

  it("a link works once (410 the second time)", async () => {
    const u = await newUser("once");
    const token = await mailedToken(u.email);
    expect((await confirm(token)).status).toBe(204);
    const again = await confirm(token, "yet another passphrase");
    expect(again.status).toBe(410);
    expect((await bodyOf(again)).error).toMatch(/expired or was already used/);
    expect((await signIn(u.email, NEW_PASSWORD)).status).toBe(200);
  });

  it("an expired link is refused (410) and changes nothing", async () => {
    const u = await newUser("expired");
    const token = await mailedToken(u.email);
    await getDb().update(passwordResetTokens).set({ expiresAt: sql`now() - interval '1 second'` }).where(eq(passwordResetTokens.tokenHash, hashToken(token)));
    expect((await confirm(token)).status).toBe(410);
    expect((await signIn(u.email, PASSWORD)).status).toBe(200);
  });

  it("expires one hour after it was requested", async () => {
    const u = await newUser("hour");
    const token = await mailedToken(u.email);
    const [row] = await getDb().select().from(passwordResetTokens).where(eq(passwordResetTokens.tokenHash, hashToken(token)));
    const ttl_s = (row!.expiresAt.getTime() - row!.createdAt.getTime()) / 1000;
    expect(ttl_s).toBeGreaterThan(3590);
    expect(ttl_s).toBeLessThan(3610);
  });

  it("a forged token of the right shape is refused (410); a malformed one is a 422 field error", async () => {
    const forged = await confirm("A".repeat(43));
    expect(forged.status).toBe(410);
    const malformed = await confirm("abc");
    expect(malformed.status).toBe(422);
    expect((await bodyOf(malformed)).fields.token).toMatch(/not valid/);
  });

  it("refuses a new password equal to the e-mail (422) without using up the link", async () => {
    const u = await newUser("weakreset");
    const token = await mailedToken(u.email);
    const res = await confirm(token, u.email);
    expect(res.status).toBe(422);
    expect((await bodyOf(res)).fields.password).toMatch(/e-mail/);
    expect((await confirm(token)).status).toBe(204);
  });

  it("using one link retires the other outstanding links of the account", async () => {
    const u = await newUser("twolinks");
    const first = await mailedToken(u.email);
    const second = await mailedToken(u.email);
    expect(first).not.toBe(second);
    expect((await confirm(second)).status).toBe(204);
    expect((await confirm(first, "some other passphrase")).status).toBe(410);
  });

  it("sends at most 3 links per account in 15 minutes, still answering 202", async () => {
    const u = await newUser("flood");
    const mailsTo = async () => (await listOutboxMessages({ limit: 1000 })).filter((m) => m.to === u.email).length;
    for (let i = 0; i < 5; i++) expect((await requestReset(u.email)).status).toBe(202);
    expect(await mailsTo()).toBe(3);
  });

  it("answers 202 for an unknown address and sends nothing", async () => {
    const before = (await listOutboxMessages({ limit: 1000 })).length;
    const res = await requestReset("nobody-at-all@example.com");
    expect(res.status).toBe(202);
    expect((await listOutboxMessages({ limit: 1000 })).length).toBe(before);
  });
});
