import { json, noContent, route } from "@/lib/http/route";
import { readLibraryItem, removeLibraryItem } from "@/lib/library/service";

type Params = { workspaceId: string; itemId: string };

export const GET = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  return json({ item: await readLibraryItem({ userId: user.id, workspaceId: ctx.params.workspaceId, itemId: ctx.params.itemId }) });
});

// 409 with the documents that use it; they must change their blocks first.
export const DELETE = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  await removeLibraryItem({ userId: user.id, workspaceId: ctx.params.workspaceId, itemId: ctx.params.itemId });
  return noContent();
});
