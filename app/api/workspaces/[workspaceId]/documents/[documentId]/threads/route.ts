// GET (?versionId=): comment threads of the document, oldest first. POST: open a thread on an
// anchor (block, parameter, ledger row) of a version, with its first comment.
import { json, route } from "@/lib/http/route";
import { createThreadSchema } from "@/lib/versions/schemas";
import { createThread, readThreads } from "@/lib/versions/server/threads";

type Params = { workspaceId: string; documentId: string };

export const GET = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  const versionId = new URL(ctx.request.url).searchParams.get("versionId") ?? undefined;
  return json({ threads: await readThreads({ userId: user.id, ...ctx.params, versionId }) });
});

export const POST = route<Params, typeof createThreadSchema>({ body: createThreadSchema }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  return json({ thread: await createThread({ userId: user.id, ...ctx.params, versionId: body.versionId, anchor: body.anchor, body: body.body }) }, 201);
});
