import type { Role } from "@/lib/schemas/fields";

// One line per role, shown next to the role so people know what they can do and why.
const SUMMARY: Record<Role, string> = {
  owner: "You manage members, roles and invitations, and edit every scenario.",
  editor: "You create and edit scenarios and save versions.",
  reviewer: "You read, comment and give review verdicts; you do not edit.",
  viewer: "You read scenarios and versions.",
};

export function roleSummary(role: Role): string {
  return SUMMARY[role];
}
