import { z } from "zod";
import { currentPasswordField, nameField, newPasswordField } from "./fields";

export const updateAccountSchema = z.object({ name: nameField });
export type UpdateAccountInput = z.input<typeof updateAccountSchema>;

export const changePasswordSchema = z
  .object({ currentPassword: currentPasswordField, newPassword: newPasswordField })
  .superRefine((v, ctx) => {
    if (v.currentPassword === v.newPassword)
      ctx.addIssue({ code: "custom", path: ["newPassword"], message: "choose a password different from the current one" });
  });
export type ChangePasswordInput = z.input<typeof changePasswordSchema>;
