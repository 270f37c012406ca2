import { authorizeWorkspace } from "@/lib/authz";
import { json, route } from "@/lib/http/route";
import { Unprocessable } from "@/lib/http/errors";
import { fieldMessages } from "@/lib/http/route";
import { readUploadRequest } from "@/lib/library/request";
import { saveRequestSchema } from "@/lib/library/schemas";
import { listLibrary, saveToLibrary } from "@/lib/library/service";

type Params = { workspaceId: string };

// GET: the workspace's library with uploader, time, source note, summary and usage.
export const GET = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  return json({ items: await listLibrary({ userId: user.id, workspaceId: ctx.params.workspaceId }) });
});

// POST: save an upload (JSON {kind, text, confirmation, name, source_note} or multipart with a
// file part). Validated again here; 422 with line-and-column issues stores nothing.
export const POST = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  // authorize before reading a body of up to 10 MiB
  await authorizeWorkspace({ userId: user.id, workspaceId: ctx.params.workspaceId, action: "library.write" });
  const { fields, bytes } = await readUploadRequest(ctx.request);
  const parsed = saveRequestSchema.safeParse(fields);
  if (!parsed.success) throw new Unprocessable(fieldMessages(parsed.error.issues));
  const input = bytes ? { bytes } : { text: parsed.data.text };
  const { preview, id } = await saveToLibrary({ userId: user.id, workspaceId: ctx.params.workspaceId, request: parsed.data, input });
  if (!preview.ok) return json({ error: "the upload has problems; nothing was saved", issues: preview.issues, proposal: preview.proposal }, 422);
  return json({ item: { id, kind: preview.kind, name: parsed.data.name, summary: preview.summary }, warnings: preview.warnings }, 201);
});
