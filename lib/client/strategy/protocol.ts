import type { JobOutcome, JobRequest } from "@/lib/engine/jobs/runner";

/** Main thread → strategy worker: one run per worker (cancel = terminate the worker). */
export type StrategyWorkerRequest = { type: "run"; request: JobRequest };

/** Strategy worker → main thread. */
export type StrategyWorkerMessage =
  | { type: "progress"; share: number; phase: string }
  | { type: "done"; outcome: JobOutcome }
  | { type: "error"; message: string };
