import type { ScenarioError } from "../../lib/engine/scenario/errors";
import type { JobResult } from "../../lib/engine/jobs/runner";

/** Messages between the job pool and a worker thread (structured clone; plain data only). */
export type ToWorker =
  | { type: "run"; id: string; request: { scenario: unknown; compare: boolean } }
  | { type: "cancel"; id: string };

export type FromWorker =
  | { type: "progress"; id: string; share: number; phase: string }
  | { type: "done"; id: string; ok: true; value: JobResult }
  | { type: "done"; id: string; ok: false; errors: ScenarioError[] }
  | { type: "error"; id: string; message: string; cancelled: boolean };
