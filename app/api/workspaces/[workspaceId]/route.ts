import { json, route } from "@/lib/http/route";
import { readWorkspace } from "@/lib/workspaces/members";

export const GET = route<{ workspaceId: string }>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  return json(await readWorkspace({ userId: user.id, workspaceId: ctx.params.workspaceId }));
});
