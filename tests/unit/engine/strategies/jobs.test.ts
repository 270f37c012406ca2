import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { canonicalJson, sha256Hex } from "@/lib/engine/jobs/hash";
import { prepareJob, runJob } from "@/lib/engine/jobs/runner";
import { JobStore, type JobExecutor } from "@/lib/engine/jobs/store";
import { example } from "../helpers";

describe("cache key", () => {
  it("SHA-256 matches node:crypto (FIPS 180-4) on empty, short, multi-block and non-ASCII text", () => {
    // The empty-string digest e3b0c442… is the published FIPS 180-4 example value (from memory); node:crypto is the oracle.
    for (const text of ["", "abc", "x".repeat(55), "y".repeat(64), "z".repeat(1000), "SOC → 0.5 ± 1 % Ω"]) {
      expect(sha256Hex(text)).toBe(createHash("sha256").update(text, "utf8").digest("hex"));
    }
    expect(sha256Hex("")).toBe("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
  });

  it("canonical JSON ignores key order; the key ignores defaults spelled out or left out", () => {
    expect(canonicalJson({ b: 1, a: [1, { d: 2, c: 3 }] })).toBe(canonicalJson({ a: [1, { c: 3, d: 2 }], b: 1 }));
    const raw = example("series-dp");
    const withDefault = { ...raw, vehicle: { ...raw.vehicle, air_density_kg_m3: 1.2 } };
    const { air_density_kg_m3: _omit, ...vehicle } = raw.vehicle;
    const a = prepareJob({ scenario: withDefault });
    const b = prepareJob({ scenario: { ...raw, vehicle } });
    const c = prepareJob({ scenario: raw, compare: true });
    if (!a.ok || !b.ok || !c.ok) throw new Error("invalid");
    expect(a.key).toBe(b.key);
    expect(c.key).not.toBe(a.key);
  });
});

describe("job runner and store", () => {
  it("reports DP progress as the share of backward steps, ending at 1, and stops on abort", () => {
    const seen: number[] = [];
    const out = runJob({ scenario: example("series-dp") }, { onProgress: (x) => seen.push(x) });
    expect(out.ok).toBe(true);
    expect(seen.length).toBeGreaterThan(10); // NEDC: 1180 backward steps, reported every 64
    expect(seen.at(-1)).toBe(1);
    const controller = new AbortController();
    let calls = 0;
    expect(() => runJob({ scenario: example("series-dp") }, { signal: controller.signal, onProgress: () => { if (++calls === 3) controller.abort(new Error("stop")); } })).toThrow("stop");
  });

  it("caches by key, cancels, and never runs more than maxRunning jobs", async () => {
    const pending: Array<() => void> = [];
    const exec: JobExecutor = (_key, payload, hooks) => new Promise((resolve, reject) => {
      hooks.onProgress(0.5, "half");
      hooks.signal.addEventListener("abort", () => reject(new Error("cancelled")));
      pending.push(() => resolve({ ok: true, value: payload as never }));
    });
    const store = new JobStore(exec, { maxRunning: 1 });
    const a = store.submit("k1", { kind: "evaluate" })!;
    expect(store.get(a.id)).toMatchObject({ state: "running", progress: 0.5, phase: "half" });
    expect(store.submit("k2", {})).toBeNull();
    pending[0]();
    await new Promise((r) => setTimeout(r, 0));
    expect(store.get(a.id)?.state).toBe("done");
    expect(store.submit("k1", {})).toMatchObject({ state: "done", cached: true });
    const b = store.submit("k3", {})!;
    expect(store.cancel(b.id)).toBe(true);
    await new Promise((r) => setTimeout(r, 0));
    expect(store.get(b.id)?.state).toBe("cancelled");
    expect(store.cancel(b.id)).toBe(false);
  });
});
