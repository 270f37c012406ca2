import * as signUpRoute from "@/app/api/auth/sign-up/route";
import * as workspacesRoute from "@/app/api/workspaces/route";
import { addMembership } from "@/db/memberships";
import type { Role } from "@/lib/schemas/fields";
import { bodyOf, call, sessionCookie } from "./http";

export const PASSWORD = "correct horse battery";
let counter = 0;

export type TestUser = { id: string; email: string; name: string; cookie: string };

export async function newUser(prefix = "user"): Promise<TestUser> {
  counter += 1;
  const email = `${prefix}${counter}-${Math.random().toString(36).slice(2, 8)}@example.com`;
  const res = await call(signUpRoute.POST, "POST", "/api/auth/sign-up", { body: { email, name: `${prefix} ${counter}`, password: PASSWORD } });
  if (res.status !== 201) throw new Error(`sign-up failed: ${res.status} ${await res.text()}`);
  const { user } = await bodyOf(res);
  return { ...user, cookie: sessionCookie(res)! };
}

export async function newWorkspace(owner: TestUser, name = "Test workspace"): Promise<string> {
  const res = await call(workspacesRoute.POST, "POST", "/api/workspaces", { body: { name }, cookie: owner.cookie });
  if (res.status !== 201) throw new Error(`create workspace failed: ${res.status} ${await res.text()}`);
  return (await bodyOf(res)).workspace.id;
}

/** A workspace with one user per role (members added directly; invitations are tested elsewhere). */
export async function teamWorkspace(): Promise<{ workspaceId: string } & Record<Role | "outsider", TestUser>> {
  const owner = await newUser("owner");
  const [editor, reviewer, viewer, outsider] = await Promise.all([newUser("editor"), newUser("reviewer"), newUser("viewer"), newUser("outsider")]);
  const workspaceId = await newWorkspace(owner);
  await addMembership({ workspaceId, userId: editor.id, role: "editor" });
  await addMembership({ workspaceId, userId: reviewer.id, role: "reviewer" });
  await addMembership({ workspaceId, userId: viewer.id, role: "viewer" });
  return { workspaceId, owner, editor, reviewer, viewer, outsider };
}
