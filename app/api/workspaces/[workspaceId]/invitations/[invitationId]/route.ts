import { noContent, route } from "@/lib/http/route";
import { revokeInvitation } from "@/lib/workspaces/invitations";

export const DELETE = route<{ workspaceId: string; invitationId: string }>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  await revokeInvitation({ actorId: user.id, ...ctx.params });
  return noContent();
});
