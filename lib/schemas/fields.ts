// Field schemas shared by every form and route handler. Messages are shown to people as-is.
import { z } from "zod";

export const PASSWORD_MIN_CHARS = 10;
// argon2 hashes whatever it gets; a cap keeps a huge password from costing a lot of CPU.
export const PASSWORD_MAX_CHARS = 200;

export const emailField = z
  .string({ error: "enter your e-mail address" })
  .trim()
  .toLowerCase()
  .min(1, "enter your e-mail address")
  .max(254, "an e-mail address has at most 254 characters")
  .pipe(z.email("enter a valid e-mail address, like name@example.com"));

export const nameField = z
  .string({ error: "enter a name" })
  .trim()
  .min(1, "enter a name")
  .max(100, "a name has at most 100 characters");

/** A new password: length rules here; "not the e-mail address" needs the address (see passwordProblem). */
export const newPasswordField = z
  .string({ error: "enter a password" })
  .min(PASSWORD_MIN_CHARS, `use at least ${PASSWORD_MIN_CHARS} characters`)
  .max(PASSWORD_MAX_CHARS, `use at most ${PASSWORD_MAX_CHARS} characters`);

/** An existing password being typed in: no rules beyond presence, so old passwords still work. */
export const currentPasswordField = z
  .string({ error: "enter your password" })
  .min(1, "enter your password")
  .max(PASSWORD_MAX_CHARS, `a password has at most ${PASSWORD_MAX_CHARS} characters`);

/**
 * The rule a schema alone cannot check when the e-mail is not in the same form.
 * Returns a message, or null when the password is acceptable.
 */
export function passwordProblem(password: string, email: string): string | null {
  if (password.length < PASSWORD_MIN_CHARS) return `use at least ${PASSWORD_MIN_CHARS} characters`;
  const pw = password.trim().toLowerCase();
  const address = email.trim().toLowerCase();
  const local = address.split("@")[0] ?? "";
  if (pw === address || (local.length > 0 && pw === local)) return "the password must not be your e-mail address";
  return null;
}

export const ROLES = ["owner", "editor", "reviewer", "viewer"] as const;
export type Role = (typeof ROLES)[number];
export const roleField = z.enum(ROLES, { error: "choose one of owner, editor, reviewer, viewer" });

/** Random tokens are 32 bytes in base64url: 43 characters. */
export const tokenField = z
  .string({ error: "the link has no token" })
  .regex(/^[A-Za-z0-9_-]{43}$/, "this link is not valid; copy the whole link from the e-mail");
