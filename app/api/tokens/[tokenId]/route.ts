import { noContent, route } from "@/lib/http/route";
import { revokeToken } from "@/lib/tokens/manage";

// Revocation is immediate: the next request with the token gets 401.
export const DELETE = route<{ tokenId: string }>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  await revokeToken({ userId: user.id, tokenId: ctx.params.tokenId });
  return noContent();
});
