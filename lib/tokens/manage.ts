import "server-only";
// Creating and revoking personal API tokens (session users only; the wrapper refuses tokens here).
import { insertApiToken, listApiTokensForUser, revokeApiToken, type ApiTokenListItem } from "@/db/api-tokens";
import { authorizeWorkspace } from "@/lib/authz";
import { NotFound, Unprocessable } from "@/lib/http/errors";
import { newApiToken } from "./format";
import { roleAtMost } from "./roles";
import type { CreateApiTokenInput } from "./schemas";

export async function createToken(args: { userId: string } & CreateApiTokenInput): Promise<{ token: string; item: ApiTokenListItem }> {
  const membership = await authorizeWorkspace({ userId: args.userId, workspaceId: args.workspaceId, action: "workspace.read" });
  if (!roleAtMost(args.role, membership.role))
    throw new Unprocessable({ role: `your role in this workspace is ${membership.role}; a token cannot have a higher role` });
  const { token, hash, prefix } = newApiToken();
  const row = await insertApiToken({ userId: args.userId, workspaceId: args.workspaceId, role: args.role, name: args.name, tokenHash: hash, prefix });
  const item = (await listApiTokensForUser({ userId: args.userId })).find((t) => t.id === row.id)!;
  return { token, item };
}

export async function revokeToken(args: { userId: string; tokenId: string }): Promise<void> {
  const ok = /^[0-9a-f-]{36}$/i.test(args.tokenId) && (await revokeApiToken(args));
  if (!ok) throw new NotFound("no such token");
}

export { listApiTokensForUser };
