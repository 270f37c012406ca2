import { z } from "zod";
import { ROLES } from "@/lib/schemas/fields";

export const createApiTokenSchema = z.strictObject({
  workspaceId: z.uuid("choose a workspace"),
  name: z.string({ error: "give the token a name" }).trim().min(1, "give the token a name").max(100, "a token name has at most 100 characters"),
  role: z.enum(ROLES, { error: `choose a role: ${ROLES.join(", ")}` }),
});
export type CreateApiTokenInput = z.output<typeof createApiTokenSchema>;
