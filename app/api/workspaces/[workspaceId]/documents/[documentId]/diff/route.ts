// GET ?from=<versionId|live>&to=<versionId|live>: the comparison of two versions.
import { Unprocessable } from "@/lib/http/errors";
import { json, route } from "@/lib/http/route";
import { diffRefs } from "@/lib/versions/server/versions";

type Params = { workspaceId: string; documentId: string };

export const GET = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  const q = new URL(ctx.request.url).searchParams;
  const from = q.get("from")?.trim() ?? "";
  const to = q.get("to")?.trim() || "live";
  if (!from) throw new Unprocessable({ from: "name the version to compare from (a version id or live)" }, "the query string is not valid");
  return json({ diff: await diffRefs({ userId: user.id, ...ctx.params, from, to }) });
});
