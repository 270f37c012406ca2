import { requestPasswordReset } from "@/lib/auth/reset";
import { json, route } from "@/lib/http/route";
import { passwordResetRequestSchema } from "@/lib/schemas/auth";

// Always 202, whether or not the address has an account.
export const POST = route({ body: passwordResetRequestSchema }, async (_ctx, body) => {
  await requestPasswordReset(body);
  return json({ message: "if an account uses this address, a link to set a new password is on its way" }, 202);
});
