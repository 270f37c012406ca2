import { z } from "zod";
import { prepareJob } from "@/lib/engine/jobs/runner";
import { json, route } from "@/lib/http/route";
import { TooManyRequests } from "@/lib/http/errors";
import { serverJobs } from "@/server/jobs";
import { resolveScenarioLibrary } from "@/lib/library/scenario-refs";

const BODY_LIMIT_BYTES = 1024 * 1024;
const MAX_JOBS_PER_USER = 4;

const bodySchema = z.strictObject({ scenario: z.unknown(), compare: z.boolean().optional() });

// POST /api/evaluate/jobs {scenario, compare?} → 202 {jobId, state, cached}: a long run (DP, or
// the rule/ECMS/DP comparison with compare: true) in a worker thread. The scenario is validated
// here first, so a bad one is a 422 at once, as in POST /api/evaluate.
export const POST = route({ body: bodySchema, maxBodyBytes: BODY_LIMIT_BYTES }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  // `cycle: { library_id }` → the library item's samples, as in POST /api/evaluate (?workspace=<id> for a session).
  const scenario = await resolveScenarioLibrary({ userId: user.id, body: body.scenario, workspaceId: new URL(ctx.request.url).searchParams.get("workspace") });
  const prepared = prepareJob({ scenario, compare: body.compare });
  if (!prepared.ok) {
    const fields: Record<string, string> = {};
    for (const e of prepared.errors) fields[`scenario.${e.path}`] ??= e.message;
    return json({ error: "the scenario is not valid", fields, errors: prepared.errors }, 422);
  }
  const { store, owners } = serverJobs();
  let mine = 0;
  for (const [id, owner] of owners) if (owner === user.id && store.get(id)?.state === "running") mine++;
  if (mine >= MAX_JOBS_PER_USER) throw new TooManyRequests(5, "too many long runs at once; wait for one to finish or cancel it");
  const status = store.submit(prepared.key, { scenario, compare: body.compare === true });
  if (!status) throw new TooManyRequests(5, "the server is busy with other long runs; try again shortly");
  owners.set(status.id, user.id);
  return json({ jobId: status.id, state: status.state, cached: status.cached }, 202);
});
