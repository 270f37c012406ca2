import { json, route } from "@/lib/http/route";
import { createApiTokenSchema } from "@/lib/tokens/schemas";
import { createToken, listApiTokensForUser } from "@/lib/tokens/manage";

// Personal API tokens of the signed-in user. The token itself is in the POST response only.
export const GET = route({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  return json({ tokens: await listApiTokensForUser({ userId: user.id }) });
});

export const POST = route({ body: createApiTokenSchema }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  const created = await createToken({ userId: user.id, ...body });
  return json({ token: created.token, item: created.item }, 201);
});
