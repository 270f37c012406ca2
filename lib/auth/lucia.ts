// The only file that imports lucia (v3 is no longer developed upstream: keep it replaceable).
// Everything else goes through lib/auth/session.ts.
import { DrizzlePostgreSQLAdapter } from "@lucia-auth/adapter-drizzle";
import { Lucia, TimeSpan } from "lucia";
import { getDb } from "@/db/pool";
import { sessions, users } from "@/db/schema";

export const SESSION_COOKIE_NAME = "joulebook_session";

function createLucia() {
  // Secure cookies only over https, or a plain-http demo on 127.0.0.1 could not sign in.
  const secure = (process.env.APP_URL ?? "").startsWith("https:");
  return new Lucia(new DrizzlePostgreSQLAdapter(getDb(), sessions, users), {
    sessionExpiresIn: new TimeSpan(30, "d"),
    sessionCookie: { name: SESSION_COOKIE_NAME, expires: true, attributes: { secure, sameSite: "lax", path: "/" } },
    getUserAttributes: (a) => ({ email: a.email, name: a.name }),
  });
}

let instance: ReturnType<typeof createLucia> | undefined;
export function getLucia(): ReturnType<typeof createLucia> {
  instance ??= createLucia();
  return instance;
}

declare module "lucia" {
  interface Register {
    Lucia: ReturnType<typeof createLucia>;
    DatabaseUserAttributes: { email: string; name: string };
  }
}
