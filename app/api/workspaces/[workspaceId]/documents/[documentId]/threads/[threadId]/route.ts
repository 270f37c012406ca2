// PATCH {resolved}: resolve or reopen a thread.
import { json, route } from "@/lib/http/route";
import { resolveThreadSchema } from "@/lib/versions/schemas";
import { setResolved } from "@/lib/versions/server/threads";

type Params = { workspaceId: string; documentId: string; threadId: string };

export const PATCH = route<Params, typeof resolveThreadSchema>({ body: resolveThreadSchema }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  return json({ thread: await setResolved({ userId: user.id, ...ctx.params, resolved: body.resolved }) });
});
