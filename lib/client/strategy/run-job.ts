import type { JobOutcome, JobRequest } from "@/lib/engine/jobs/runner";
import { canonicalJson, sha256Hex } from "@/lib/engine/jobs/hash";
import type { StrategyWorkerMessage, StrategyWorkerRequest } from "./protocol";

/**
 * Results of this browser tab, keyed by the hash of the request as given (lib/engine/jobs/hash.ts).
 * The scenario is validated in the worker, so the engine (zod and all) stays out of the page's bundle.
 */
const cache = new Map<string, Extract<JobOutcome, { ok: true }>>();
const CACHE_SIZE = 16;

export interface RunHooks {
  signal?: AbortSignal;
  onProgress?: (share: number, phase: string) => void;
}

/**
 * Runs a long strategy job in a fresh Web Worker. Resolves with the outcome (invalid
 * scenarios included), from the cache when the same scenario ran before; rejects with an
 * AbortError when cancelled (the worker is terminated at once).
 */
export function runStrategyJob(request: JobRequest, hooks: RunHooks = {}): Promise<JobOutcome> {
  const key = keyOf(request);
  const hit = key ? cache.get(key) : undefined;
  if (hit) {
    hooks.onProgress?.(1, "done (cached)");
    return Promise.resolve(hit);
  }
  return new Promise((resolve, reject) => {
    if (hooks.signal?.aborted) return reject(new DOMException("cancelled", "AbortError"));
    const worker = new Worker(new URL("./strategy.worker.ts", import.meta.url), { type: "module" });
    const stop = () => {
      worker.terminate();
      reject(new DOMException("cancelled", "AbortError"));
    };
    hooks.signal?.addEventListener("abort", stop, { once: true });
    const finish = () => {
      hooks.signal?.removeEventListener("abort", stop);
      worker.terminate();
    };
    worker.onmessage = (event: MessageEvent<StrategyWorkerMessage>) => {
      const m = event.data;
      if (m.type === "progress") return hooks.onProgress?.(m.share, m.phase);
      finish();
      if (m.type === "error") return reject(new Error(m.message));
      if (m.outcome.ok && key) {
        cache.set(key, m.outcome);
        while (cache.size > CACHE_SIZE) cache.delete(cache.keys().next().value as string);
      }
      resolve(m.outcome);
    };
    worker.onerror = (event) => {
      finish();
      reject(new Error(`the strategy worker failed: ${event.message}`));
    };
    worker.postMessage({ type: "run", request: { scenario: request.scenario, compare: request.compare === true } } satisfies StrategyWorkerRequest);
  });
}

function keyOf(request: JobRequest): string | null {
  try {
    return sha256Hex(canonicalJson({ job: request.compare ? "compare" : "evaluate", scenario: request.scenario }));
  } catch {
    return null; // not plain JSON (e.g. a non-finite number): run without the cache
  }
}
