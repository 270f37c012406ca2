import { JobStore } from "../../lib/engine/jobs/store";
import { workerExecutor } from "./pool";

/**
 * The server's job store (one per server process): jobs run in worker threads, results are
 * cached by scenario hash. Jobs belong to the user who started them.
 */
const globalKey = Symbol.for("joulebook.jobs");
type Holder = { store: JobStore; owners: Map<string, string> };

export function serverJobs(): Holder {
  const g = globalThis as unknown as Record<symbol, Holder | undefined>;
  // One store across hot reloads in development.
  g[globalKey] ??= { store: new JobStore(workerExecutor(), { maxRunning: 2, cacheSize: 32 }), owners: new Map() };
  return g[globalKey];
}
