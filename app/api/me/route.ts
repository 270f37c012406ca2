import { listWorkspacesForUser } from "@/db/memberships";
import { renameUser } from "@/lib/auth/accounts";
import { json, route } from "@/lib/http/route";
import { updateAccountSchema } from "@/lib/schemas/account";

export const GET = route({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  return json({ user, workspaces: await listWorkspacesForUser({ userId: user.id }) });
});

export const PATCH = route({ body: updateAccountSchema }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  return json({ user: await renameUser({ userId: user.id, name: body.name }) });
});
