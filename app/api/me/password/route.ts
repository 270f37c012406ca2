import { changePassword } from "@/lib/auth/accounts";
import { noContent, route } from "@/lib/http/route";
import { changePasswordSchema } from "@/lib/schemas/account";

// Every other session of the account ends; this browser gets a new session cookie.
export const POST = route({ body: changePasswordSchema }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  ctx.setCookie(await changePassword({ userId: user.id, ...body }));
  return noContent();
});
