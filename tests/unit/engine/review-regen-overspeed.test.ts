import { describe, expect, it } from "vitest";
import { evaluateScenarioInput } from "@/lib/engine";
import { example } from "./helpers";

/**
 * DESIGN §4: speed above maximum is an infeasible step — report it, never hide it. The motor
 * of a battery-electric car is geared to the wheels, so it spins above its maximum whether it
 * drives or brakes. Closed-form: 100 km/h on 0.31 m wheels through 8.5:1 is
 * (100/3.6)/0.31·8.5 = 761.65 rad/s = 7273 rpm, above a 3000 rpm maximum; on a −15 % grade
 * every moving step brakes (m·g·sin α far above the road load), so before this fix the
 * over-speed was never reported.
 */
describe("review: motor over-speed while braking is reported", () => {
  it("BEV held at 100 km/h down a 15 % grade with a 3000 rpm motor", () => {
    const raw = example("bev");
    raw.motor.max_speed_rpm = 3000;
    const speed = [100, 100, 100, 100, 100, 100];
    raw.cycle = { dt_s: 1, speed_kmh: speed, grade_pct: speed.map(() => -15) };
    const out = evaluateScenarioInput(raw);
    if (!out.ok) throw new Error(out.errors[0].message);
    const r = out.result;
    expect(r.traces.wheel_power_w.every((p) => p < 0)).toBe(true);
    const f = r.findings.find((x) => x.code === "motor_speed_above_max");
    expect(f).toBeDefined();
    expect(f!.steps).toBe(5);
    expect(f!.time_start_s).toBe(0);
    expect(f!.time_end_s).toBe(5);
    expect(f!.worst!.demanded).toBeCloseTo((100 / 3.6 / 0.31) * 8.5 * (30 / Math.PI), 6);
    expect(f!.worst!.available).toBeCloseTo(3000, 9);
    expect(r.kpi.feasible).toBe(false);
    // the energy flow is unchanged: no regeneration above the maximum speed, brakes take it all
    expect(r.ledger_j.motor).toBe(0);
    expect(r.ledger_j.unmet_demand).toBe(0);
  });
});
