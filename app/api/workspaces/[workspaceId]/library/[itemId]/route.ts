import { json, noContent, route } from "@/lib/http/route";
import { readLibraryItem, removeLibraryItem } from "@/lib/library/service";

type Params = { workspaceId: string; itemId: string };

// ?usage=1 adds usedBy (documents whose blocks name the item: cycle, full-load or OCV reference).
export const GET = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  const withUsage = new URL(ctx.request.url).searchParams.get("usage") === "1";
  return json({ item: await readLibraryItem({ userId: user.id, workspaceId: ctx.params.workspaceId, itemId: ctx.params.itemId, withUsage }) });
});

// 409 with the documents that use it; they must change their blocks first.
export const DELETE = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  await removeLibraryItem({ userId: user.id, workspaceId: ctx.params.workspaceId, itemId: ctx.params.itemId });
  return noContent();
});
