import { describe, expect, it } from "vitest";
import { evaluateScenario } from "@/lib/engine";
import { example, parsed, walkNumbers } from "../helpers";

// DESIGN §4: DP must stay correct when the SOC grid spacing is coarser than one step's SOC
// change and when moves are infeasible; it never returns a plan that ignores the constraints
// and says when the window cannot be met. Checked through the full evaluation (CLI / API path).
function dpScenario(pt: "parallel" | "series", socPoints: number, window: [number, number], cycle = "nedc") {
  const raw = example(pt);
  raw.cycle = { standard: cycle };
  raw.strategy = { kind: "dp", soc_points: socPoints, control_points: 21, soc_final_min: window[0], soc_final_max: window[1] };
  return parsed(raw);
}

describe("DP through evaluateScenario", () => {
  for (const pt of ["parallel", "series"] as const) {
    const soc0 = pt === "parallel" ? 0.6 : 0.5;
    for (const points of [3, 5, 11]) {
      it(`${pt}: ${points} SOC points (coarser than a step's SOC change) meet the window or say so`, () => {
        const out = evaluateScenario(dpScenario(pt, points, [soc0 - 0.002, soc0 + 0.002]));
        if (!out.ok) throw new Error(out.errors[0].message);
        const r = out.result;
        expect(walkNumbers(r).filter(([, v]) => !Number.isFinite(v))).toEqual([]);
        const codes = r.findings.map((f) => f.code);
        const inWindow = r.kpi.soc_final! >= soc0 - 0.002 - 1e-12 && r.kpi.soc_final! <= soc0 + 0.002 + 1e-12;
        expect(inWindow || codes.includes("dp_window_missed") || codes.includes("dp_window_unreachable")).toBe(true);
        expect(r.kpi.feasible).toBe(true);
      });
    }
  }

  it("an unreachable window (0.79–0.80 from 0.50 on one ECE-15) is a finding with the miss, never NaN", () => {
    const out = evaluateScenario(dpScenario("series", 201, [0.79, 0.8], "ece15"));
    if (!out.ok) throw new Error(out.errors[0].message);
    const r = out.result;
    expect(walkNumbers(r).filter(([, v]) => !Number.isFinite(v))).toEqual([]);
    const f = r.findings.find((x) => x.code === "dp_window_unreachable");
    expect(f?.message).toMatch(/missing the window by 0\.\d{4}/);
    expect(r.kpi.soc_final!).toBeLessThan(0.79);
    expect(r.kpi.feasible).toBe(true);
  });

  it("a grid far too coarse for the cycle is flagged by the grid-sensitivity pass", () => {
    const out = evaluateScenario(dpScenario("parallel", 9, [0.59, 0.61]));
    if (!out.ok) throw new Error(out.errors[0].message);
    const fine = evaluateScenario(dpScenario("parallel", 201, [0.59, 0.61]));
    if (!fine.ok) throw new Error("fine");
    const rel = Math.abs(out.result.kpi.fuel_g - fine.result.kpi.fuel_g) / fine.result.kpi.fuel_g;
    const flagged = out.result.findings.some((x) => x.code === "dp_grid_sensitive");
    // Either the coarse grid is already within 1 % of the fine one, or it must be flagged.
    expect(flagged || rel < 0.01).toBe(true);
  });

  it("ECMS from the strategy block runs on both hybrids and stays within the limits", () => {
    for (const name of ["parallel-ecms", "series-ecms"]) {
      const out = evaluateScenario(parsed(example(name)));
      if (!out.ok) throw new Error(out.errors[0].message);
      expect(out.result.strategy).toBe("ecms");
      expect(out.result.kpi.feasible).toBe(true);
      expect(Math.abs(out.result.closure_error_j) / out.result.ledger_j.fuel).toBeLessThan(1e-9);
    }
  });
});

describe("a cycle the hardware cannot follow", () => {
  // DESIGN §4: infeasible steps are reported, never hidden; DP and ECMS must still return a plan
  // that respects the battery limits and the window, not collapse because of those steps.
  for (const kind of ["dp", "ecms"] as const) {
    it(`${kind}: a 20 kW motor on NEDC reports motor-torque findings, keeps the window, never NaN`, () => {
      const raw = example("series");
      raw.motor = { ...raw.motor, peak_power_kw: 20 };
      raw.strategy = kind === "dp"
        ? { kind, soc_points: 101, control_points: 21, soc_final_min: 0.5, soc_final_max: 0.502 }
        : { kind, equivalence_factor: 3, soc_feedback_gain: 20, soc_target: 0.5, control_points: 21 };
      const out = evaluateScenario(parsed(raw));
      if (!out.ok) throw new Error(out.errors[0].message);
      const r = out.result;
      expect(walkNumbers(r).filter(([, v]) => !Number.isFinite(v))).toEqual([]);
      expect(r.kpi.feasible).toBe(false);
      const codes = new Set(r.findings.filter((f) => f.severity === "infeasible").map((f) => f.code));
      expect([...codes]).toEqual(["motor_torque_above_limit"]); // the only limit broken is the hardware's
      if (kind === "dp") {
        expect(r.kpi.soc_final!).toBeGreaterThanOrEqual(0.5 - 1e-12);
        expect(r.kpi.soc_final!).toBeLessThanOrEqual(0.502 + 1e-12);
      }
    });
  }
});

describe("DP size", () => {
  it("a DP too large for memory is refused with a message naming soc_points, not run", () => {
    // 150,001 samples × 1001 SOC points ≈ 1.1 GB of cost-to-go: above the 256 MB limit (ours).
    const raw = example("series");
    raw.cycle = { dt_s: 1, speed_kmh: Array.from({ length: 150_001 }, (_, i) => (i % 600 < 10 ? 0 : 30)) };
    raw.strategy = { kind: "dp", soc_points: 1001, control_points: 11, soc_final_min: 0.5, soc_final_max: 0.51 };
    const out = evaluateScenario(parsed(raw));
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.errors[0].message).toMatch(/needs \d+ MB .*strategy\.soc_points/);
  });
});
