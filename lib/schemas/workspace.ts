import { z } from "zod";
import { emailField, roleField } from "./fields";

export const createWorkspaceSchema = z.object({
  name: z
    .string({ error: "enter a workspace name" })
    .trim()
    .min(1, "enter a workspace name")
    .max(80, "a workspace name has at most 80 characters"),
});
export type CreateWorkspaceInput = z.input<typeof createWorkspaceSchema>;

export const inviteSchema = z.object({ email: emailField, role: roleField });
export type InviteInput = z.input<typeof inviteSchema>;

export const changeRoleSchema = z.object({ role: roleField });
export type ChangeRoleInput = z.input<typeof changeRoleSchema>;
