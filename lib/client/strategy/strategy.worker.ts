// Web Worker for long strategy runs (DP, the rule/ECMS/DP comparison): progress while the
// DP backward pass runs; cancel is the main thread terminating this worker, because a
// synchronous run cannot read messages (SharedArrayBuffer would need cross-origin isolation).
import { runJob } from "@/lib/engine/jobs/runner";
import type { StrategyWorkerMessage, StrategyWorkerRequest } from "./protocol";

const scope = self as unknown as { onmessage: ((e: MessageEvent<StrategyWorkerRequest>) => void) | null; postMessage: (m: StrategyWorkerMessage) => void };

scope.onmessage = (event) => {
  let last = 0;
  try {
    const outcome = runJob(event.data.request, {
      onProgress: (share, phase) => {
        const now = performance.now();
        if (now - last < 50 && share < 1) return; // at most ~20 messages a second
        last = now;
        scope.postMessage({ type: "progress", share, phase });
      },
    });
    scope.postMessage({ type: "done", outcome });
  } catch (error) {
    scope.postMessage({ type: "error", message: error instanceof Error ? error.message : String(error) });
  }
};
