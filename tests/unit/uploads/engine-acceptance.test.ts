import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { previewCycle } from "@/lib/uploads";
import { evaluateScenarioInput } from "@/lib/engine";

const example = () => JSON.parse(readFileSync(fileURLToPath(new URL("../../../examples/bev.json", import.meta.url)), "utf8"));

describe("an uploaded cycle runs in the engine", () => {
  it("a resampled upload with grade evaluates and its distance equals the trapezoid distance of the samples", () => {
    const text = "Time (s)\tSpeed (m/s)\tGrade (%)\n0\t0\t0\n2\t3\t1\n5\t9\t2\n7\t9\t2\n10\t0\t0\n";
    const guess = previewCycle({ text }); // median spacing 2.5 s; ask for 1 s
    const r = previewCycle({ text }, { ...guess.confirmation!, dt_s: 1 });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const scenario = { ...example(), cycle: { dt_s: r.cycle.dt_s, speed_kmh: r.cycle.speed_kmh, grade_pct: r.cycle.grade_pct } };
    const out = evaluateScenarioInput(scenario);
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    // trapezoid of the original rows in m/s: (0+3)/2·2 + (3+9)/2·3 + 9·2 + (9+0)/2·3 = 3 + 18 + 18 + 13.5 = 52.5 m;
    // every row lies on the 1 s grid, so the resampled linear ramps integrate to the same distance
    expect(out.result.kpi.distance_km * 1000).toBeCloseTo(52.5, 9);
  });
});
