// The seed is run by every `npm run demo` and `npm test`: it must be idempotent and its demo
// sign-ins must work.
import { count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import * as signInRoute from "@/app/api/auth/sign-in/route";
import * as meRoute from "@/app/api/me/route";
import { getDb } from "@/db/pool";
import { memberships, users, workspaces } from "@/db/schema";
import { DEMO_PASSWORD, DEMO_USERS, DEMO_WORKSPACE_NAME, seedFoundation } from "@/scripts/seed/foundation";
import { bodyOf, call, sessionCookie } from "./support/http";

const n = async (t: typeof users | typeof workspaces | typeof memberships) => (await getDb().select({ n: count() }).from(t))[0]!.n;

describe("seed", () => {
  it("creates the demo team once, however often it runs", async () => {
    await seedFoundation({});
    await seedFoundation({});
    expect(await n(users)).toBe(4);
    expect(await n(workspaces)).toBe(1);
    expect(await n(memberships)).toBe(4);
    const [ws] = await getDb().select().from(workspaces).where(eq(workspaces.name, DEMO_WORKSPACE_NAME));
    expect(ws).toBeTruthy();
  });

  it.each(DEMO_USERS.map((u) => [u.email, u.role] as const))("%s signs in with the demo password and is %s", async (email, role) => {
    await seedFoundation({});
    const res = await call(signInRoute.POST, "POST", "/api/auth/sign-in", { body: { email, password: DEMO_PASSWORD }, ip: `10.0.0.${email.length}` });
    expect(res.status).toBe(200);
    const me = await bodyOf(await call(meRoute.GET, "GET", "/api/me", { cookie: sessionCookie(res) }));
    expect(me.workspaces).toEqual([expect.objectContaining({ name: DEMO_WORKSPACE_NAME, role })]);
  });
});
