import { signUp } from "@/lib/auth/accounts";
import { json, route } from "@/lib/http/route";
import { signUpSchema } from "@/lib/schemas/auth";

export const POST = route({ body: signUpSchema }, async (ctx, body) => {
  const { user, cookie } = await signUp(body);
  ctx.setCookie(cookie);
  return json({ user }, 201);
});
