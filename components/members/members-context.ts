"use client";
import { createContext, useContext } from "react";
import type { Role } from "@/lib/schemas/fields";
import type { MemberRow } from "./types";

// What the table cells need beyond the row: who is looking, what they may do, and the actions.
// A context keeps the column definitions stable at module scope (TanStack Table wants that).
export type MembersTableActions = {
  currentUserId: string;
  canManage: boolean;
  busyUserId?: string;
  /** Set when exactly one owner is left: that member can be neither removed nor leave. */
  soleOwnerId?: string;
  changeRole: (member: MemberRow, role: Role) => void;
  askRemove: (member: MemberRow) => void;
};

export const MembersTableContext = createContext<MembersTableActions | null>(null);

export function useMembersTable(): MembersTableActions {
  const value = useContext(MembersTableContext);
  if (!value) throw new Error("MembersTableContext is missing");
  return value;
}
