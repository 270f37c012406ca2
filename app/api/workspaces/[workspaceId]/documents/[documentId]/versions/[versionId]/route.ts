// GET: one version with its document snapshot, Scenario and Result summary (read-only view).
import { json, route } from "@/lib/http/route";
import { readVersion } from "@/lib/versions/server/versions";

type Params = { workspaceId: string; documentId: string; versionId: string };

export const GET = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  return json({ version: await readVersion({ userId: user.id, ...ctx.params }) });
});
