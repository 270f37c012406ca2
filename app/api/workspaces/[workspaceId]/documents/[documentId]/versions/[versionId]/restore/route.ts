// POST: restore a version as a new forward change on the live document (history is kept).
import { json, route } from "@/lib/http/route";
import { restoreVersion } from "@/lib/versions/server/versions";

type Params = { workspaceId: string; documentId: string; versionId: string };

export const POST = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  return json(await restoreVersion({ userId: user.id, ...ctx.params }));
});
