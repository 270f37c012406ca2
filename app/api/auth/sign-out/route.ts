import { blankSessionCookie, endSession } from "@/lib/auth/session";
import { noContent, route } from "@/lib/http/route";

// Signing out while signed out is not an error: the cookie is cleared either way.
export const POST = route({}, async (ctx) => {
  const current = await ctx.session();
  ctx.setCookie(current ? await endSession(current.sessionId) : blankSessionCookie());
  return noContent();
});
