import { prepareJob, type JobOutcome, type JobRequest } from "@/lib/engine/jobs/runner";
import type { StrategyWorkerMessage, StrategyWorkerRequest } from "./protocol";

/** Results of this browser tab, keyed by the scenario hash (lib/engine/jobs/hash.ts). */
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
  const prepared = prepareJob(request);
  if (!prepared.ok) return Promise.resolve(prepared);
  const hit = cache.get(prepared.key);
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
      if (m.outcome.ok) {
        cache.set(prepared.key, m.outcome);
        while (cache.size > CACHE_SIZE) cache.delete(cache.keys().next().value as string);
      }
      resolve(m.outcome);
    };
    worker.onerror = (event) => {
      finish();
      reject(new Error(`the strategy worker failed: ${event.message}`));
    };
    worker.postMessage({ type: "run", request: { scenario: prepared.request.scenario, compare: prepared.request.compare } } satisfies StrategyWorkerRequest);
  });
}
