import { z } from "zod";
import { currentPasswordField, emailField, nameField, newPasswordField, passwordProblem, tokenField } from "./fields";

export const signUpSchema = z
  .object({ email: emailField, name: nameField, password: newPasswordField })
  .superRefine((v, ctx) => {
    const problem = passwordProblem(v.password, v.email);
    if (problem) ctx.addIssue({ code: "custom", path: ["password"], message: problem });
  });
export type SignUpInput = z.input<typeof signUpSchema>;

export const signInSchema = z.object({ email: emailField, password: currentPasswordField });
export type SignInInput = z.input<typeof signInSchema>;

export const passwordResetRequestSchema = z.object({ email: emailField });
export type PasswordResetRequestInput = z.input<typeof passwordResetRequestSchema>;

/** The e-mail rule is checked on the server, where the account is known. */
export const passwordResetConfirmSchema = z.object({ token: tokenField, password: newPasswordField });
export type PasswordResetConfirmInput = z.input<typeof passwordResetConfirmSchema>;
