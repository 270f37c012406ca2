import { describe, expect, it } from "vitest";
import { simulate } from "@/lib/engine/simulate";
import { planDp } from "@/lib/engine/strategies/dp/solve";
import { dpWindowFindings } from "@/lib/engine/strategies/dp/findings";
import { enumerate, tinyPlant, tinyScenario } from "./tiny";

// REFERENCES.md: "On a small problem, DP must equal brute-force enumeration of all control
// sequences." DP with an interpolated cost-to-go is approximate, so the checks are:
//  * identity: the DP plan is a real control sequence simulated with the exact model, so its
//    fuel can never be below the enumerated optimum, and it must respect every limit and the window;
//  * with a fine SOC grid (1e-4 spacing against moves of ~1e-2 per step) it must match the
//    optimum to 0.1 % (interpolation error; our tolerance, no source).
const CASES = [
  { name: "series, 4 candidates", pt: "series" as const, v: [0, 7, 14, 20, 16, 8, 0], cp: 4, dt: 1 },
  { name: "series, 3 candidates", pt: "series" as const, v: [0, 8, 16, 22, 26, 20, 12], cp: 3 },
  { name: "parallel, 4 candidates in traction", pt: "parallel" as const, v: [0, 7, 14, 21, 27, 32, 36], cp: 3 },
  { name: "series, 4 candidates, dt = 2 s", pt: "series" as const, v: [0, 12, 22, 30, 24, 12, 0], cp: 4, dt: 2 },
];

describe("DP against brute-force enumeration (exact model, tiny problems)", () => {
  for (const c of CASES) {
    for (const window of [[0.49, 0.51], [0.5, 0.8], [0.3, 0.47]] as [number, number][]) {
      it(`${c.name}, window ${window.join("–")}`, () => {
        const s = tinyScenario(c.pt, c.v, window, c.cp, c.dt ?? 1);
        const plant = tinyPlant(s);
        const e = enumerate(plant, c.cp, window);
        for (const socPoints of [5001, 3]) {
          const plan = planDp(plant, { socPoints, controlPoints: c.cp, socFinalMin: window[0], socFinalMax: window[1] });
          const run = simulate(plant, plan.strategy, 0.5);
          expect(plan.reachable, `reachable with ${socPoints} SOC points`).toBe(e.feasibleCount > 0);
          if (e.feasibleCount === 0) continue;
          expect(run.tracker.infeasibleSteps).toBe(0);
          expect(run.socFinal).toBeGreaterThanOrEqual(window[0] - 1e-12);
          expect(run.socFinal).toBeLessThanOrEqual(window[1] + 1e-12);
          expect(run.ledger.fuel).toBeGreaterThanOrEqual(e.bestFuel_j * (1 - 1e-12));
          if (socPoints === 5001) expect(run.ledger.fuel).toBeLessThanOrEqual(e.bestFuel_j * 1.001 + 1e-6);
        }
      });
    }
  }

  it("an unreachable window gives a finding with the miss, gets as close as the limits allow, never NaN", () => {
    const window: [number, number] = [0.79, 0.8];
    const s = tinyScenario("series", [0, 7, 14, 20, 16, 8, 0], window, 4);
    const plant = tinyPlant(s);
    const e = enumerate(plant, 4, window);
    expect(e.feasibleCount).toBe(0);
    const plan = planDp(plant, { socPoints: 201, controlPoints: 4, socFinalMin: window[0], socFinalMax: window[1] });
    expect(plan.reachable).toBe(false);
    const run = simulate(plant, plan.strategy, 0.5);
    expect(run.tracker.infeasibleSteps).toBe(0);
    // Steering towards the window each step reaches the highest final SOC the limits allow.
    expect(run.socFinal).toBeCloseTo(e.maxFinalSoc, 9);
    const f = dpWindowFindings(plan, plant.demand, 0.5, run.socFinal);
    expect(f.map((x) => x.code)).toEqual(["dp_window_unreachable"]);
    expect(f[0].message).toContain(`missing the window by ${(0.79 - run.socFinal).toFixed(4)}`);
  });
});
