import { z } from "zod";
import { evaluateScenarioInput } from "@/lib/engine";
import { json, route } from "@/lib/http/route";
import { resolveScenarioLibrary } from "@/lib/library/scenario-refs";

export const EVALUATE_BODY_LIMIT_BYTES = 1024 * 1024;

// Signed-in users only: evaluation costs CPU. The engine validates the scenario itself, so the
// wrapper only parses JSON (z.unknown) and the engine's errors become the 422 body.
export const POST = route({ body: z.unknown(), maxBodyBytes: EVALUATE_BODY_LIMIT_BYTES }, async (ctx, body) => {
  const { user } = await ctx.requireUser();
  // `cycle: { library_id }` → the library item's samples (issue 7); other Scenarios pass unchanged
  const scenario = await resolveScenarioLibrary({ userId: user.id, body, workspaceId: new URL(ctx.request.url).searchParams.get("workspace") });
  const outcome = evaluateScenarioInput(scenario);
  if (outcome.ok) return json(outcome.result);
  const fields: Record<string, string> = {};
  for (const e of outcome.errors) fields[e.path] ??= e.message;
  return json({ error: "the scenario is not valid", fields, errors: outcome.errors }, 422);
});
