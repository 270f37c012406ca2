import { signIn } from "@/lib/auth/accounts";
import { json, route } from "@/lib/http/route";
import { signInSchema } from "@/lib/schemas/auth";

export const POST = route({ body: signInSchema }, async (ctx, body) => {
  const { user, cookie } = await signIn({ ...body, ip: ctx.ip });
  ctx.setCookie(cookie);
  return json({ user });
});
