// POST {verdict, comment}: a reviewer of the round approves or requests changes.
import { json, route } from "@/lib/http/route";
import { verdictSchema } from "@/lib/versions/schemas";
import { giveVerdict } from "@/lib/versions/server/reviews";

type Params = { workspaceId: string; documentId: string; roundId: string };

export const POST = route<Params, typeof verdictSchema>({ body: verdictSchema }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  return json({ round: await giveVerdict({ userId: user.id, ...ctx.params, verdict: body.verdict, comment: body.comment }) });
});
