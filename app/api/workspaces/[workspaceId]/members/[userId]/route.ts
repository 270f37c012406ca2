import { json, noContent, route } from "@/lib/http/route";
import { changeRoleSchema } from "@/lib/schemas/workspace";
import { changeMemberRole, removeMember } from "@/lib/workspaces/members";

type Params = { workspaceId: string; userId: string };

export const PATCH = route<Params, typeof changeRoleSchema>({ body: changeRoleSchema }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  const member = await changeMemberRole({ actorId: user.id, workspaceId: ctx.params.workspaceId, userId: ctx.params.userId, role: body.role });
  return json({ member });
});

export const DELETE = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  await removeMember({ actorId: user.id, workspaceId: ctx.params.workspaceId, userId: ctx.params.userId });
  return noContent();
});
