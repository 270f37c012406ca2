import { authorizeWorkspace } from "@/lib/authz";
import { json, route, fieldMessages } from "@/lib/http/route";
import { Unprocessable } from "@/lib/http/errors";
import { readUploadRequest } from "@/lib/library/request";
import { previewRequestSchema } from "@/lib/library/schemas";
import { previewForUser } from "@/lib/library/service";

// Upload preview: proposal (columns, units), validated data, statistics and the published-cycle
// label — nothing is stored. 200 with ok:false and the issues when the file has problems, so the
// confirmation screen can show the proposal beside them.
export const POST = route<{ workspaceId: string }>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  // authorize before reading a body of up to 10 MiB
  await authorizeWorkspace({ userId: user.id, workspaceId: ctx.params.workspaceId, action: "library.write" });
  const { fields, bytes } = await readUploadRequest(ctx.request);
  const parsed = previewRequestSchema.safeParse({ kind: fields.kind, text: fields.text, confirmation: fields.confirmation });
  if (!parsed.success) throw new Unprocessable(fieldMessages(parsed.error.issues));
  const input = bytes ? { bytes } : { text: parsed.data.text };
  const preview = await previewForUser({ userId: user.id, workspaceId: ctx.params.workspaceId, kind: parsed.data.kind, input, confirmation: parsed.data.confirmation });
  return json(preview);
});
