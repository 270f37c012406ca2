import type { ScenarioError } from "../scenario/errors";
import type { JobResult } from "./runner";

export type JobState = "running" | "done" | "failed" | "cancelled";

export interface JobStatus {
  id: string;
  state: JobState;
  /** 0..1 */
  progress: number;
  phase: string;
  /** Served from the cache (same scenario and kind as an earlier job). */
  cached: boolean;
  result?: JobResult;
  errors?: ScenarioError[];
  error?: string;
}

/** Runs one job somewhere (worker thread, Web Worker); resolves with the outcome, rejects when cancelled. */
export type JobExecutor = (key: string, payload: unknown, hooks: { signal: AbortSignal; onProgress: (share: number, phase: string) => void }) => Promise<
  { ok: true; value: JobResult } | { ok: false; errors: ScenarioError[] }
>;

interface Entry {
  status: JobStatus;
  controller: AbortController;
  key: string;
  finishedAt: number;
}

/**
 * Job bookkeeping shared by the server and the browser (no I/O): ids, states, progress,
 * cancel, and a result cache keyed by the scenario hash (LRU, `cacheSize` entries). Finished
 * jobs are forgotten after `keepMs`; at most `maxRunning` jobs run at once.
 */
export class JobStore {
  private readonly jobs = new Map<string, Entry>();
  private readonly cache = new Map<string, JobResult>();
  private seq = 0;

  constructor(
    private readonly executor: JobExecutor,
    private readonly opts: { cacheSize?: number; keepMs?: number; maxRunning?: number; now?: () => number; newId?: () => string } = {},
  ) {}

  running(): number {
    let n = 0;
    for (const e of this.jobs.values()) if (e.status.state === "running") n++;
    return n;
  }

  /** Starts a job for a validated payload with its cache key; returns null when too many run already. */
  submit(key: string, payload: unknown): JobStatus | null {
    this.sweep();
    const id = this.opts.newId?.() ?? `job-${Date.now().toString(36)}-${(++this.seq).toString(36)}`;
    const controller = new AbortController();
    const hit = this.cache.get(key);
    if (hit) {
      this.cache.delete(key);
      this.cache.set(key, hit); // most recently used
      const status: JobStatus = { id, state: "done", progress: 1, phase: "done", cached: true, result: hit };
      this.jobs.set(id, { status, controller, key, finishedAt: this.now() });
      return status;
    }
    if (this.running() >= (this.opts.maxRunning ?? 2)) return null;
    const status: JobStatus = { id, state: "running", progress: 0, phase: "queued", cached: false };
    const entry: Entry = { status, controller, key, finishedAt: 0 };
    this.jobs.set(id, entry);
    this.executor(key, payload, {
      signal: controller.signal,
      onProgress: (share, phase) => {
        if (status.state === "running") { status.progress = Math.max(status.progress, Math.min(1, share)); status.phase = phase; }
      },
    }).then(
      (out) => {
        if (status.state !== "running") return;
        entry.finishedAt = this.now();
        if (out.ok) {
          Object.assign(status, { state: "done", progress: 1, phase: "done", result: out.value });
          this.remember(key, out.value);
        } else Object.assign(status, { state: "failed", errors: out.errors, error: "the scenario is not valid" });
      },
      (err: unknown) => {
        if (status.state !== "running") return;
        entry.finishedAt = this.now();
        if (controller.signal.aborted) Object.assign(status, { state: "cancelled" });
        else Object.assign(status, { state: "failed", error: err instanceof Error ? err.message : String(err) });
      },
    );
    return status;
  }

  get(id: string): JobStatus | null {
    return this.jobs.get(id)?.status ?? null;
  }

  /** Cancels a running job (true), or reports that it was not running (false). */
  cancel(id: string): boolean {
    const e = this.jobs.get(id);
    if (!e || e.status.state !== "running") return false;
    e.controller.abort(new Error("cancelled"));
    e.status.state = "cancelled";
    e.finishedAt = this.now();
    return true;
  }

  private remember(key: string, value: JobResult): void {
    this.cache.set(key, value);
    const max = this.opts.cacheSize ?? 32;
    while (this.cache.size > max) this.cache.delete(this.cache.keys().next().value as string);
  }

  private sweep(): void {
    const keep = this.opts.keepMs ?? 15 * 60_000;
    const now = this.now();
    for (const [id, e] of this.jobs) if (e.status.state !== "running" && now - e.finishedAt > keep) this.jobs.delete(id);
  }

  private now(): number {
    return this.opts.now?.() ?? Date.now();
  }
}
