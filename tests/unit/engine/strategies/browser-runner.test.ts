import { afterEach, describe, expect, it, vi } from "vitest";
import { runJob } from "@/lib/engine/jobs/runner";
import { runStrategyJob } from "@/lib/client/strategy/run-job";
import type { StrategyWorkerMessage, StrategyWorkerRequest } from "@/lib/client/strategy/protocol";
import { example } from "../helpers";

/** Stands in for the browser's Web Worker: runs the job as strategy.worker.ts does, answering on a later tick. */
class FakeWorker {
  static created = 0;
  static terminated = 0;
  onmessage: ((e: { data: StrategyWorkerMessage }) => void) | null = null;
  onerror: ((e: { message: string }) => void) | null = null;
  private dead = false;
  constructor() { FakeWorker.created++; }
  postMessage(m: StrategyWorkerRequest) {
    setTimeout(() => {
      if (this.dead) return;
      const outcome = runJob(m.request, { onProgress: (share, phase) => this.onmessage?.({ data: { type: "progress", share, phase } }) });
      if (!this.dead) this.onmessage?.({ data: { type: "done", outcome } });
    }, 5);
  }
  terminate() { this.dead = true; FakeWorker.terminated++; }
}

describe("browser strategy runner (lib/client/strategy/run-job.ts)", () => {
  afterEach(() => vi.unstubAllGlobals());

  it("reports progress, returns the result, serves a repeat from the cache, cancels by terminating", async () => {
    vi.stubGlobal("Worker", FakeWorker);
    const scenario = example("series-dp");
    const seen: number[] = [];
    const out = await runStrategyJob({ scenario }, { onProgress: (x) => seen.push(x) });
    expect(out.ok && out.value.kind).toBe("evaluate");
    expect(seen.at(-1)).toBe(1);
    const created = FakeWorker.created;
    const again = await runStrategyJob({ scenario });
    expect(again).toBe(out);
    expect(FakeWorker.created).toBe(created); // no new worker for a cached scenario
    const controller = new AbortController();
    const pending = runStrategyJob({ scenario: { ...scenario, name: "cancelled run" } }, { signal: controller.signal });
    controller.abort();
    await expect(pending).rejects.toMatchObject({ name: "AbortError" });
    expect(FakeWorker.terminated).toBeGreaterThanOrEqual(2);
  });

  it("an invalid scenario comes back as errors naming the field, not as an exception", async () => {
    vi.stubGlobal("Worker", FakeWorker);
    const raw = example("series-dp");
    const out = await runStrategyJob({ scenario: { ...raw, battery: { ...raw.battery, capacity_ah: -1 } } });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.errors[0].path).toBe("battery.capacity_ah");
  });
});
