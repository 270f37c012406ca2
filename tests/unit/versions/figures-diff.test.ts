import { describe, expect, it } from "vitest";
import * as Y from "yjs";
import { SINK_KEYS } from "@/lib/engine";
import { createScenarioDoc, readBlocks, readDoc, setParam } from "@/lib/notebook";
import { bucketMeans, diffVersions, thinTraces, versionContent, type ResultSummary } from "@/lib/versions";

function vanAt(mass: string): { doc: Y.Doc; summary: ResultSummary } {
  const doc = createScenarioDoc("conventional", "Van");
  const body = readBlocks(doc).find((b) => b.kind === "body")!.id;
  setParam(doc, body, "mass", mass);
  const content = versionContent(readDoc(doc));
  expect(content.problems).toEqual([]);
  return { doc, summary: content.summary! };
}

describe("versionContent", () => {
  it("a draft that does not compile keeps its snapshot and says why there is no result", () => {
    const doc = createScenarioDoc("conventional", "Van");
    const engine = readBlocks(doc).find((b) => b.kind === "engine")!.id;
    setParam(doc, engine, "displacement", "");
    const c = versionContent(readDoc(doc));
    expect(c.scenario).toBeNull();
    expect(c.summary).toBeNull();
    expect(c.problems.join(" ")).toMatch(/displacement.*empty/i);
  });
});

describe("diffVersions: figures", () => {
  const a = vanAt("1500 kg");
  const b = vanAt("2100 kg");
  const d = diffVersions({ label: "v1", doc: readDoc(a.doc), summary: a.summary }, { label: "v2", doc: readDoc(b.doc), summary: b.summary });

  it("rolling resistance scales with mass (F = c_r·m·g while moving, DESIGN §4), and the ledger row shows it", () => {
    const row = d.ledger!.find((r) => r.key === "rolling")!;
    expect(row.side).toBe("sink");
    // same cycle, same c_r, flat road: E_roll ∝ m, so B/A = 2100/1500
    expect(row.to_j! / row.from_j!).toBeCloseTo(2100 / 1500, 12);
    expect(row.delta_j).toBeCloseTo(row.to_j! - row.from_j!, 6);
    // aerodynamic drag does not depend on mass (½·ρ·c_d·A·v̄²)
    const aero = d.ledger!.find((r) => r.key === "aero")!;
    expect(aero.delta_j).toBeCloseTo(0, 6);
  });

  it("KPI deltas are B − A with relative change; the heavier van uses more fuel", () => {
    const fuel = d.kpi!.find((k) => k.key === "fuel_l_per_100km")!;
    expect(fuel.unit).toBe("L/100 km");
    expect(fuel.delta).toBeGreaterThan(0);
    expect(fuel.delta).toBeCloseTo((fuel.to as number) - (fuel.from as number), 12);
    expect(fuel.relative).toBeCloseTo(fuel.delta! / (fuel.from as number), 12);
    const distance = d.kpi!.find((k) => k.key === "distance_km")!;
    expect(distance.delta).toBe(0);
    // conventional: no battery, so no SOC on either side
    expect(d.kpi!.find((k) => k.key === "soc_final")).toMatchObject({ from: null, to: null, delta: null, relative: null });
  });

  it("the waterfall starts at A's total, ends at B's, and its bars add up", () => {
    const w = d.waterfall!;
    const sum = (s: ResultSummary) => SINK_KEYS.reduce((x, k) => x + s.ledger_j[k], 0) / 3.6e6;
    expect(w[0]).toMatchObject({ key: "total_a", kind: "total", start_kwh: 0 });
    expect(w[0]!.end_kwh).toBeCloseTo(sum(a.summary), 12);
    expect(w.at(-1)).toMatchObject({ key: "total_b", kind: "total" });
    expect(w.at(-1)!.end_kwh).toBeCloseTo(sum(b.summary), 12);
    const middle = w.slice(1, -1);
    expect(middle.length).toBeGreaterThan(0);
    // each bar starts where the previous ended; the last ends at B's total
    middle.forEach((s, i) => {
      const prevEnd = i === 0 ? w[0]!.end_kwh : middle[i - 1]!.end_kwh;
      expect(s.start_kwh).toBeCloseTo(prevEnd, 12);
      expect(s.end_kwh - s.start_kwh).toBeCloseTo(s.delta_kwh, 12);
      expect(s.kind).toBe(s.delta_kwh >= 0 ? "increase" : "decrease");
    });
    expect(middle.at(-1)!.end_kwh).toBeCloseTo(w.at(-1)!.end_kwh, 9);
    expect(middle.find((s) => s.key === "rolling")!.kind).toBe("increase");
  });

  it("overlaid traces carry both sides for every series on the same time grid", () => {
    const speedA = d.traces!.filter((p) => p.series === "speed_kmh" && p.side === "A");
    const speedB = d.traces!.filter((p) => p.series === "speed_kmh" && p.side === "B");
    expect(speedA.length).toBe(a.summary.traces.time_s.length);
    expect(speedB.map((p) => p.value)).toEqual(speedA.map((p) => p.value));
    expect(d.traces!.every((p) => Number.isFinite(p.value))).toBe(true);
  });

  it("a side without a result gives KPI rows with nulls and no waterfall", () => {
    const half = diffVersions({ label: "v1", doc: readDoc(a.doc), summary: a.summary }, { label: "draft", doc: readDoc(a.doc), summary: null });
    expect(half.waterfall).toBeNull();
    expect(half.kpi!.every((k) => k.to === null && k.delta === null)).toBe(true);
    expect(half.traces!.every((p) => p.side === "A")).toBe(true);
  });
});

describe("trace thinning", () => {
  it("bucket means keep the sum (energy of a power trace): Σ mean·n = Σ samples", () => {
    const values = Array.from({ length: 1181 }, (_, i) => Math.sin(i / 7) * 1000 + i);
    const size = 3;
    const means = bucketMeans(values, size);
    expect(means).toHaveLength(Math.ceil(1181 / size));
    const restored = means.reduce((s, m, i) => s + m * Math.min(size, values.length - i * size), 0);
    expect(restored).toBeCloseTo(values.reduce((s, v) => s + v, 0), 6);
  });

  it("thinning keeps at most the budget and the first time stamp of each bucket", () => {
    const { summary } = vanAt("1500 kg");
    expect(summary.traces.steps_total).toBe(1180); // NEDC: 1180 s at dt = 1 s (UNECE R83 annex 4a)
    expect(summary.traces.time_s.length).toBeLessThanOrEqual(400);
    expect(summary.traces.time_s[0]).toBe(0);
    expect(summary.traces.time_s[1]).toBe(3); // ceil(1180 / 400) = 3 steps per bucket
    const t = thinTraces({ ...fakeTraces(10) }, 4);
    expect(t.time_s).toEqual([0, 3, 6, 9]);
  });
});

function fakeTraces(n: number) {
  const seq = Array.from({ length: n }, (_, i) => i);
  const zeros = seq.map(() => 0);
  return {
    time_s: seq, speed_kmh: seq, gear: zeros, wheel_power_w: zeros, brake_power_w: zeros, engine_on: zeros, engine_power_w: zeros,
    engine_speed_rpm: zeros, engine_torque_nm: zeros, motor_power_w: zeros, motor_torque_nm: zeros, generator_power_w: zeros,
    battery_power_w: zeros, battery_current_a: zeros, soc: zeros, fuel_rate_g_s: zeros,
  };
}
