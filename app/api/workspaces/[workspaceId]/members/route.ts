import { json, route } from "@/lib/http/route";
import { readMembers } from "@/lib/workspaces/members";

export const GET = route<{ workspaceId: string }>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  return json(await readMembers({ userId: user.id, workspaceId: ctx.params.workspaceId }));
});
