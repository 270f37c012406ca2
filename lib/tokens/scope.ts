// The token scope of the request being handled. The route wrapper runs a token-authenticated
// handler inside `runWithTokenScope`; authorizeWorkspace reads it to keep the token to its
// workspace and cap its role, so route handlers need no token-specific code.
import { AsyncLocalStorage } from "node:async_hooks";
import type { Role } from "@/lib/schemas/fields";

export type TokenScope = { tokenId: string; workspaceId: string; role: Role };

const store = new AsyncLocalStorage<TokenScope>();

export function runWithTokenScope<T>(scope: TokenScope, fn: () => Promise<T>): Promise<T> {
  return store.run(scope, fn);
}

export function currentTokenScope(): TokenScope | null {
  return store.getStore() ?? null;
}
