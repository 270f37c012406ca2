import { json, route } from "@/lib/http/route";
import { inviteSchema } from "@/lib/schemas/workspace";
import { inviteMember } from "@/lib/workspaces/invitations";

export const POST = route<{ workspaceId: string }, typeof inviteSchema>({ body: inviteSchema }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  return json(await inviteMember({ actorId: user.id, workspaceId: ctx.params.workspaceId, ...body }), 201);
});
