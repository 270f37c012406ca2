// The live-recalculation schedule: first edit at once, one run in flight, edits coalesced,
// at least the spacing between starts. Behaviour spelled out in lib/client/notebook/schedule.ts.
import { afterEach, beforeEach, describe, expect, test, vi } from "vitest";
import { createScheduler } from "@/lib/client/notebook/schedule";

describe("evaluation schedule", () => {
  let now = 0;
  beforeEach(() => { vi.useFakeTimers(); now = 1000; });
  afterEach(() => vi.useRealTimers());
  const advance = (ms: number) => { now += ms; vi.advanceTimersByTime(ms); };

  test("the first edit after a quiet spell starts at once", () => {
    const start = vi.fn();
    const s = createScheduler(start, 150, () => now);
    s.poke();
    expect(start).toHaveBeenCalledTimes(1);
  });

  test("edits during a run are coalesced into one run after it, spaced from the previous start", () => {
    const start = vi.fn();
    const s = createScheduler(start, 150, () => now);
    s.poke();
    advance(10);
    s.poke(); s.poke(); s.poke();
    expect(start).toHaveBeenCalledTimes(1); // still in flight
    advance(20);
    s.done(); // 30 ms after the start: the next one waits until 150 ms
    expect(start).toHaveBeenCalledTimes(1);
    advance(119);
    expect(start).toHaveBeenCalledTimes(1);
    advance(1);
    expect(start).toHaveBeenCalledTimes(2);
    s.done();
    advance(1000);
    expect(start).toHaveBeenCalledTimes(2); // nothing new: no run
  });

  test("dispose cancels a planned run", () => {
    const start = vi.fn();
    const s = createScheduler(start, 150, () => now);
    s.poke(); s.done(); s.poke();
    s.dispose();
    advance(1000);
    expect(start).toHaveBeenCalledTimes(1);
  });
});
