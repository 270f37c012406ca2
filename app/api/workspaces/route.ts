import { json, route } from "@/lib/http/route";
import { createWorkspaceSchema } from "@/lib/schemas/workspace";
import { createWorkspace } from "@/lib/workspaces/members";

export const POST = route({ body: createWorkspaceSchema }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  return json({ workspace: await createWorkspace({ userId: user.id, name: body.name }) }, 201);
});
