// POST {body}: reply in a thread.
import { json, route } from "@/lib/http/route";
import { replySchema } from "@/lib/versions/schemas";
import { replyToThread } from "@/lib/versions/server/threads";

type Params = { workspaceId: string; documentId: string; threadId: string };

export const POST = route<Params, typeof replySchema>({ body: replySchema }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  return json({ thread: await replyToThread({ userId: user.id, ...ctx.params, body: body.body }) }, 201);
});
