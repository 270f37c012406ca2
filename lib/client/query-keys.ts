// Query keys in one place so that mutations invalidate exactly what they changed.
export const queryKeys = {
  me: ["me"] as const,
  workspace: (workspaceId: string) => ["workspace", workspaceId] as const,
  members: (workspaceId: string) => ["workspace", workspaceId, "members"] as const,
  invitation: (token: string) => ["invitation", token] as const,
};
