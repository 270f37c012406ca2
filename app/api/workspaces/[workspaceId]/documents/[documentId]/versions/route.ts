// GET: the document's versions, newest first (no Yjs state, no traces). POST: save the live
// document as a new named version; the server compiles and evaluates it itself.
import { json, route } from "@/lib/http/route";
import { saveVersionSchema } from "@/lib/versions/schemas";
import { readVersions, saveVersion } from "@/lib/versions/server/versions";

type Params = { workspaceId: string; documentId: string };

export const GET = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  return json({ versions: await readVersions({ userId: user.id, ...ctx.params }) });
});

export const POST = route<Params, typeof saveVersionSchema>({ body: saveVersionSchema }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  return json({ version: await saveVersion({ userId: user.id, ...ctx.params, name: body.name, message: body.message }) }, 201);
});
