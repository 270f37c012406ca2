// GET: the document's review rounds, newest first. POST: ask named reviewers to review a version.
import { json, route } from "@/lib/http/route";
import { requestReviewSchema } from "@/lib/versions/schemas";
import { readRounds, requestReview } from "@/lib/versions/server/reviews";

type Params = { workspaceId: string; documentId: string };

export const GET = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  return json({ rounds: await readRounds({ userId: user.id, ...ctx.params }) });
});

export const POST = route<Params, typeof requestReviewSchema>({ body: requestReviewSchema }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  return json({ round: await requestReview({ userId: user.id, ...ctx.params, ...body }) }, 201);
});
