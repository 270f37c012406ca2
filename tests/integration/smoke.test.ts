import { describe, expect, it } from "vitest";
import * as signUpRoute from "@/app/api/auth/sign-up/route";
import * as meRoute from "@/app/api/me/route";
import { bodyOf, call, sessionCookie } from "./support/http";

describe("smoke", () => {
  it("signs up and reads /api/me", async () => {
    const res = await call(signUpRoute.POST, "POST", "/api/auth/sign-up", { body: { email: "A@Example.com", name: "A", password: "long enough pw" } });
    expect(res.status).toBe(201);
    const cookie = sessionCookie(res);
    expect(cookie).toBeTruthy();
    const me = await call(meRoute.GET, "GET", "/api/me", { cookie });
    expect(me.status).toBe(200);
    expect((await bodyOf(me)).user.email).toBe("a@example.com");
  });
});
