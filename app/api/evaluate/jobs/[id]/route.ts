import { json, route } from "@/lib/http/route";
import { NotFound } from "@/lib/http/errors";
import { serverJobs } from "@/server/jobs";

type Params = { id: string };

function ownJob(id: string, userId: string) {
  const { store, owners } = serverJobs();
  const status = owners.get(id) === userId ? store.get(id) : null;
  if (!status) throw new NotFound("no such job");
  return { store, status };
}

// GET /api/evaluate/jobs/:id → {state, progress, phase, cached, result?, errors?, error?}
export const GET = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  const { status } = ownJob(ctx.params.id, user.id);
  const { id: _id, ...rest } = status;
  return json(rest);
});

// DELETE /api/evaluate/jobs/:id → cancels a running job; {state} afterwards.
export const DELETE = route<Params>({}, async (ctx) => {
  const { user } = await ctx.requireUser();
  const { store, status } = ownJob(ctx.params.id, user.id);
  store.cancel(ctx.params.id);
  return json({ state: status.state });
});
