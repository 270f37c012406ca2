import { json, route } from "@/lib/http/route";
import { NotFound } from "@/lib/http/errors";
import { tokenField } from "@/lib/schemas/fields";
import { describeInvitation } from "@/lib/workspaces/invitations";

// Public: holding the link is what lets someone see whom it invites and to what.
export const GET = route<{ token: string }>({}, async (ctx) => {
  if (!tokenField.safeParse(ctx.params.token).success) throw new NotFound("this invitation link is not valid; ask the workspace owner for a new one");
  return json(await describeInvitation({ token: ctx.params.token }));
});
