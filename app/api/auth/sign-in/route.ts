import { signIn } from "@/lib/auth/accounts";
import { endSession } from "@/lib/auth/session";
import { json, route } from "@/lib/http/route";
import { signInSchema } from "@/lib/schemas/auth";

export const POST = route({ body: signInSchema }, async (ctx, body) => {
  const { user, cookie } = await signIn({ ...body, ip: ctx.ip });
  // A session this browser already had is replaced, not left behind (no session fixation).
  const previous = await ctx.session();
  if (previous) await endSession(previous.sessionId);
  ctx.setCookie(cookie);
  return json({ user });
});
