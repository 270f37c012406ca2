import type { Role } from "@/lib/schemas/fields";

export type MemberRow = { userId: string; email: string; name: string; role: Role };
export type InvitationRow = { id: string; email: string; role: Role; expiresAt: string };
export type MembersResponse = { members: MemberRow[]; invitations: InvitationRow[] };

export const ROLE_OPTIONS: readonly { value: Role; label: string }[] = [
  { value: "owner", label: "Owner" },
  { value: "editor", label: "Editor" },
  { value: "reviewer", label: "Reviewer" },
  { value: "viewer", label: "Viewer" },
];
