import type { Role } from "@/lib/schemas/fields";

/** Roles from most to least powerful; a token's role is the lower of its own and its creator's. */
const RANK: Record<Role, number> = { owner: 3, editor: 2, reviewer: 1, viewer: 0 };

export function lowerRole(a: Role, b: Role): Role {
  return RANK[a] <= RANK[b] ? a : b;
}

export function roleAtMost(role: Role, ceiling: Role): boolean {
  return RANK[role] <= RANK[ceiling];
}
