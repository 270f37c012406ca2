// Which role may do what. Pure and client-safe: pages use it to hide controls, the server
// (authorize.ts) uses it to decide. Every permission in the product is one row here.
import type { Role } from "@/lib/schemas/fields";

export type { Role } from "@/lib/schemas/fields";
export { ROLES } from "@/lib/schemas/fields";

export const ACTIONS = [
  "workspace.read",
  "workspace.manage",
  "members.read",
  "members.manage",
  "document.read",
  "document.create",
  "document.edit",
  "document.delete",
  "version.read",
  "version.save",
  "comment.read",
  "comment.write",
  "comment.resolve",
  "review.request",
  "review.verdict",
  "library.read",
  "library.write",
  "library.delete",
] as const;
export type Action = (typeof ACTIONS)[number];

const READ: Action[] = ["workspace.read", "members.read", "document.read", "version.read", "comment.read", "library.read"];
const GRANTS: Record<Role, ReadonlySet<Action>> = {
  owner: new Set(ACTIONS),
  editor: new Set([
    ...READ,
    "document.create",
    "document.edit",
    "document.delete",
    "version.save",
    "comment.write",
    "comment.resolve",
    "review.request",
    "library.write",
    "library.delete",
  ]),
  // Reviewers read, comment and give verdicts; they never edit.
  reviewer: new Set([...READ, "comment.write", "comment.resolve", "review.verdict"]),
  viewer: new Set(READ),
};

export function can(role: Role, action: Action): boolean {
  return GRANTS[role].has(action);
}

/** Only owners may hand out the owner role; everything else follows members.manage. */
export function canGrantRole(actorRole: Role, granted: Role): boolean {
  if (!can(actorRole, "members.manage")) return false;
  return granted !== "owner" || actorRole === "owner";
}
