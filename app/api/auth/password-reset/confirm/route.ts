import { confirmPasswordReset } from "@/lib/auth/reset";
import { noContent, route } from "@/lib/http/route";
import { passwordResetConfirmSchema } from "@/lib/schemas/auth";

export const POST = route({ body: passwordResetConfirmSchema }, async (_ctx, body) => {
  await confirmPasswordReset(body);
  return noContent();
});
