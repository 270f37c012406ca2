import { describe, expect, it } from "vitest";
import { evaluateScenario } from "@/lib/engine";
import { example, parsed } from "../helpers";

// The documented parallel rule (docs/strategies.md): electric launch below a speed, SOC band,
// and optional load-point shifting towards a fraction of the full-load torque.
function run(strategy: Record<string, unknown>) {
  const out = evaluateScenario(parsed({ ...example("parallel"), strategy: { kind: "rule", ...strategy } }));
  if (!out.ok) throw new Error(out.errors[0].message);
  return out.result;
}

describe("parallel rule", () => {
  it("drives electrically only at or below the launch speed, and never breaks a limit", () => {
    const r = run({ electric_speed_max_kmh: 30 });
    const t = r.traces;
    for (let k = 0; k < t.time_s.length; k++) {
      const traction = t.wheel_power_w[k] > 0 && t.speed_kmh[k] > 0;
      if (traction && t.engine_on[k] === 0) expect(t.speed_kmh[k]).toBeLessThanOrEqual(30 + 1e-9);
    }
    expect(r.kpi.feasible).toBe(true);
  });

  it("load-point shifting puts the engine nearer its full-load torque and charges more", () => {
    const plain = run({});
    const shifted = run({ shift_torque_fraction: 0.8 });
    const meanLoad = (r: typeof plain) => {
      let sum = 0, n = 0;
      r.traces.engine_torque_nm.forEach((tq, k) => { if (r.traces.engine_on[k] && r.traces.speed_kmh[k] > 0 && tq > 0) { sum += tq; n++; } });
      return sum / n;
    };
    // Willans: brake efficiency e·P/(P + P0) rises with torque at a given speed (REFERENCES.md, Willans line).
    expect(meanLoad(shifted)).toBeGreaterThan(meanLoad(plain));
    expect(shifted.kpi.soc_final!).toBeGreaterThan(plain.kpi.soc_final!);
    expect(shifted.kpi.feasible).toBe(true);
  });

  it("rejects a shift fraction outside 0..1 with the field named", () => {
    expect(() => parsed({ ...example("parallel"), strategy: { kind: "rule", shift_torque_fraction: 1.5 } })).toThrow(/strategy\.shift_torque_fraction/);
  });
});
