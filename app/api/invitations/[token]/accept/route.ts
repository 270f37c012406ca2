import { json, route } from "@/lib/http/route";
import { NotFound } from "@/lib/http/errors";
import { tokenField } from "@/lib/schemas/fields";
import { acceptInvitation } from "@/lib/workspaces/invitations";

export const POST = route<{ token: string }>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  if (!tokenField.safeParse(ctx.params.token).success) throw new NotFound("this invitation link is not valid; ask the workspace owner for a new one");
  return json(await acceptInvitation({ token: ctx.params.token, user }));
});
