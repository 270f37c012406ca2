import { parseScenario } from "../scenario/parse";
import type { ScenarioError } from "../scenario/errors";
import type { Scenario } from "../scenario/schema";
import { evaluateScenario } from "../evaluate";
import type { Result } from "../result";
import { compareStrategies, type Comparison } from "../strategies/compare";
import { canonicalJson, sha256Hex } from "./hash";

/** A long run: evaluate a scenario (its own strategy, e.g. DP) or compare the strategies on it. */
export interface JobRequest {
  scenario: unknown;
  compare?: boolean;
}

export type JobResult = { kind: "evaluate"; result: Result } | { kind: "compare"; comparison: Comparison };

export type JobOutcome =
  | { ok: true; key: string; value: JobResult }
  | { ok: false; errors: ScenarioError[] };

export interface JobHooks {
  signal?: AbortSignal;
  /** Share done, 0..1 (for DP: share of backward steps done), and the phase. */
  onProgress?: (share: number, phase: string) => void;
}

export type Prepared = { ok: true; key: string; request: { scenario: Scenario; compare: boolean } } | { ok: false; errors: ScenarioError[] };

/**
 * Validates the request and computes its cache key: SHA-256 of the canonical JSON of the
 * validated scenario (defaults filled in, so equivalent inputs share a key) and the job kind.
 */
export function prepareJob(req: JobRequest): Prepared {
  const parsed = parseScenario(req.scenario);
  if (!parsed.ok) return parsed;
  const compare = req.compare === true;
  const key = sha256Hex(canonicalJson({ job: compare ? "compare" : "evaluate", scenario: parsed.scenario }));
  return { ok: true, key, request: { scenario: parsed.scenario, compare } };
}

/** Runs a prepared job synchronously (inside a worker). Throws the signal's reason when cancelled. */
export function runPreparedJob(p: Extract<Prepared, { ok: true }>, hooks: JobHooks = {}): JobOutcome {
  const { scenario, compare } = p.request;
  if (compare) {
    const out = compareStrategies(scenario, { signal: hooks.signal, onProgress: hooks.onProgress });
    if (!out.ok) {
      const path = out.reason.startsWith("DP over") ? "strategy.soc_points" : "powertrain";
      const value = path === "powertrain" ? scenario.powertrain : scenario.strategy?.kind === "dp" ? scenario.strategy.soc_points : 201;
      return { ok: false, errors: [{ path, value, rule: out.reason, message: `${path}: ${out.reason}` }] };
    }
    return { ok: true, key: p.key, value: { kind: "compare", comparison: out.comparison } };
  }
  const out = evaluateScenario(scenario, { signal: hooks.signal, onProgress: (x) => hooks.onProgress?.(x, "DP backward pass") });
  if (!out.ok) return out;
  hooks.onProgress?.(1, "done");
  return { ok: true, key: p.key, value: { kind: "evaluate", result: out.result } };
}

export function runJob(req: JobRequest, hooks: JobHooks = {}): JobOutcome {
  const p = prepareJob(req);
  if (!p.ok) return p;
  return runPreparedJob(p, hooks);
}
