import { eq } from "drizzle-orm";
import { getDb, type Tx } from "./pool";
import { memberships, workspaces } from "./schema";

export type Workspace = { id: string; name: string };

/** Creates the workspace with its creator as owner, in one transaction. */
export async function createWorkspaceWithOwner(args: { name: string; ownerId: string }): Promise<Workspace> {
  return getDb().transaction(async (tx) => {
    const [ws] = await tx.insert(workspaces).values({ name: args.name }).returning({ id: workspaces.id, name: workspaces.name });
    if (!ws) throw new Error("workspace insert returned nothing");
    await tx.insert(memberships).values({ workspaceId: ws.id, userId: args.ownerId, role: "owner" });
    return ws;
  });
}

export async function getWorkspace(args: { id: string; tx?: Tx }): Promise<Workspace | null> {
  const rows = await (args.tx ?? getDb())
    .select({ id: workspaces.id, name: workspaces.name })
    .from(workspaces)
    .where(eq(workspaces.id, args.id))
    .limit(1);
  return rows[0] ?? null;
}
