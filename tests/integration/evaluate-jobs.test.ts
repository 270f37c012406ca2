// Long runs through the API: POST /api/evaluate/jobs → 202 {jobId}; GET → {state, progress, result?};
// DELETE → cancel. Jobs run in worker threads (server/jobs) and are cached by scenario hash.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import * as jobsRoute from "@/app/api/evaluate/jobs/route";
import * as jobRoute from "@/app/api/evaluate/jobs/[id]/route";
import * as evaluateRoute from "@/app/api/evaluate/route";
import { bodyOf, call } from "./support/http";
import { newUser } from "./support/users";

const seriesDp = JSON.parse(readFileSync("examples/series-dp.json", "utf8")) as Record<string, unknown>;
const post = (cookie: string | undefined, body: unknown) => call(jobsRoute.POST, "POST", "/api/evaluate/jobs", { cookie, body });
const get = (cookie: string, id: string) => call(jobRoute.GET, "GET", `/api/evaluate/jobs/${id}`, { cookie, params: { id } });
const del = (cookie: string, id: string) => call(jobRoute.DELETE, "DELETE", `/api/evaluate/jobs/${id}`, { cookie, params: { id } });

async function waitDone(cookie: string, id: string, timeoutMs = 60_000) {
  const end = Date.now() + timeoutMs;
  const seen: number[] = [];
  for (;;) {
    const body = await bodyOf(await get(cookie, id));
    seen.push(body.progress);
    if (body.state !== "running") return { body, seen };
    if (Date.now() > end) throw new Error("job did not finish");
    await new Promise((r) => setTimeout(r, 100));
  }
}

describe("POST /api/evaluate/jobs", () => {
  it("needs a signed-in user (401) and a valid scenario (422 naming the field)", async () => {
    expect((await post(undefined, { scenario: seriesDp })).status).toBe(401);
    const u = await newUser("jobbad");
    const res = await post(u.cookie, { scenario: { ...seriesDp, strategy: { ...(seriesDp.strategy as object), soc_final_min: 0.9 } } });
    expect(res.status).toBe(422);
    expect(Object.keys((await bodyOf(res)).fields)).toContain("scenario.strategy.soc_final_min");
  });

  it("runs a DP scenario in a worker thread with progress; the same scenario again comes from the cache", async () => {
    const u = await newUser("jobdp");
    const res = await post(u.cookie, { scenario: seriesDp });
    expect(res.status).toBe(202);
    const { jobId, cached } = await bodyOf(res);
    expect(cached).toBe(false);
    const { body, seen } = await waitDone(u.cookie, jobId);
    expect(body.state).toBe("done");
    expect(body.progress).toBe(1);
    for (let i = 1; i < seen.length; i++) expect(seen[i]).toBeGreaterThanOrEqual(seen[i - 1]); // progress never goes back
    expect(body.result.kind).toBe("evaluate");
    expect(body.result.result.strategy).toBe("dp");
    expect(body.result.result.kpi.soc_final).toBeGreaterThanOrEqual(0.499 - 1e-12);
    const again = await bodyOf(await post(u.cookie, { scenario: seriesDp }));
    expect(again).toMatchObject({ state: "done", cached: true });
    // Another user cannot see the job.
    const other = await newUser("jobother");
    expect((await get(other.cookie, jobId)).status).toBe(404);
  }, 90_000);

  it("cancels a running comparison (DELETE)", async () => {
    const u = await newUser("jobcancel");
    const res = await post(u.cookie, { scenario: { ...seriesDp, name: "cancel me" }, compare: true });
    const { jobId } = await bodyOf(res);
    const cancelled = await bodyOf(await del(u.cookie, jobId));
    expect(cancelled.state).toBe("cancelled");
    expect((await bodyOf(await get(u.cookie, jobId))).state).toBe("cancelled");
  });

  it("compares rule / ECMS / DP", async () => {
    const u = await newUser("jobcmp");
    const { jobId } = await bodyOf(await post(u.cookie, { scenario: seriesDp, compare: true }));
    const { body } = await waitDone(u.cookie, jobId);
    expect(body.state).toBe("done");
    expect(body.result.comparison.strategies.map((s: { kind: string }) => s.kind)).toEqual(["thermostat", "ecms", "dp"]);
  }, 90_000);
});

describe("POST /api/evaluate with the strategy block (ECMS, DP)", () => {
  it("evaluates ECMS and DP examples synchronously, with the strategy named in the Result", async () => {
    const u = await newUser("evalstrat");
    for (const name of ["parallel-ecms", "series-ecms", "parallel-dp", "series-dp"]) {
      const scenario = JSON.parse(readFileSync(`examples/${name}.json`, "utf8"));
      const res = await call(evaluateRoute.POST, "POST", "/api/evaluate", { cookie: u.cookie, body: scenario });
      expect(res.status, name).toBe(200);
      const r = await bodyOf(res);
      expect(r.strategy).toBe(scenario.strategy.kind);
      expect(r.kpi.feasible).toBe(true);
      if (scenario.strategy.kind === "dp") {
        expect(r.kpi.soc_final).toBeGreaterThanOrEqual(scenario.strategy.soc_final_min - 1e-12);
        expect(r.kpi.soc_final).toBeLessThanOrEqual(scenario.strategy.soc_final_max + 1e-12);
      }
    }
  }, 60_000);
});
