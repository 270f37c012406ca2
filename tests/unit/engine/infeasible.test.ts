import { describe, expect, it } from "vitest";
import { evaluateScenarioInput, type Result } from "@/lib/engine";
import { example, walkNumbers } from "./helpers";

function evaluate(raw: unknown): Result {
  const out = evaluateScenarioInput(raw);
  if (!out.ok) throw new Error(out.errors[0].message);
  return out.result;
}

function expectNoNaN(r: Result): void {
  const text = JSON.stringify(r);
  const back = JSON.parse(text);
  // JSON turns NaN/Infinity into null; walk both the object and its round trip.
  for (const [path, v] of walkNumbers(r)) if (!Number.isFinite(v)) throw new Error(`${path} = ${v}`);
  expect(walkNumbers(back).length).toBe(walkNumbers(r).length);
  // every trace is dense: one finite number per step (no holes, which JSON would turn into null)
  for (const [name, arr] of Object.entries(r.traces)) {
    expect(arr.length, name).toBe(r.cycle.steps);
    for (let k = 0; k < arr.length; k++) if (typeof arr[k] !== "number" || !Number.isFinite(arr[k])) throw new Error(`${name}[${k}] = ${arr[k]}`);
  }
}

describe("a powertrain that cannot follow the cycle", () => {
  it("tiny engine: feasible false, grouped engine-torque findings with demanded vs available, no NaN", () => {
    const raw = example("conventional");
    raw.engine.max_torque_nm.torque_nm = [20, 25, 25, 25, 22, 20];
    const r = evaluate(raw);
    expect(r.kpi.feasible).toBe(false);
    expect(r.kpi.infeasible_steps).toBeGreaterThan(50);
    const f = r.findings.filter((x) => x.code === "engine_torque_above_full_load");
    expect(f.length).toBeGreaterThan(0);
    expect(f.length).toBeLessThan(r.kpi.infeasible_steps / 3); // grouped, not one per step
    expect(f.length).toBeLessThanOrEqual(12);
    for (const x of f) {
      expect(x.severity).toBe("infeasible");
      expect(x.component).toBe("engine");
      expect(x.worst!.demanded).toBeGreaterThan(x.worst!.available);
      expect(x.time_end_s!).toBeGreaterThan(x.time_start_s!);
      expect(x.message).toMatch(/N·m demanded/);
    }
    expect(r.ledger_j.unmet_demand).toBeGreaterThan(0);
    const scale = Object.values(r.ledger_j).reduce((a, b) => a + Math.abs(b), 0);
    expect(Math.abs(r.closure_error_j) / scale).toBeLessThan(1e-9);
    expectNoNaN(r);
  });

  it("tiny motor and weak battery (bev): motor torque and battery power findings, no NaN", () => {
    const raw = example("bev");
    raw.motor = { ...raw.motor, peak_power_kw: 5, peak_torque_nm: 20 };
    raw.battery = { ...raw.battery, resistance_ohm: 20, capacity_ah: 2, max_discharge_c: 1 };
    const r = evaluate(raw);
    expect(r.kpi.feasible).toBe(false);
    const codes = new Set(r.findings.map((x) => x.code));
    expect(codes.has("motor_torque_above_limit")).toBe(true);
    expect(codes.has("battery_discharge_current_above_limit")).toBe(true);
    expectNoNaN(r);
  });

  it("battery beyond U²/(4R) is clamped and reported, never a square root of a negative", () => {
    const raw = example("bev");
    raw.battery = { ...raw.battery, resistance_ohm: 50 };
    const r = evaluate(raw);
    expect(r.findings.some((x) => x.code === "battery_power_above_max")).toBe(true);
    expectNoNaN(r);
  });

  it("series genset asked for more than the engine can give; engine over-speed in the conventional", () => {
    const raw = example("series");
    raw.engine.max_torque_nm.torque_nm = raw.engine.max_torque_nm.torque_nm.map(() => 10);
    raw.strategy.on_power_kw = 30;
    const r = evaluate(raw);
    expect(r.findings.some((x) => x.code === "generator_power_above_limit")).toBe(true);
    expectNoNaN(r);
    const c = example("conventional");
    c.driveline.gear_ratios = [3.6, 2.1, 1.8, 1.7, 1.6];
    c.cycle = { standard: "eudc" };
    const rc = evaluate(c);
    expect(rc.findings.some((x) => x.code === "engine_speed_above_max" && x.worst!.unit === "rpm")).toBe(true);
    expectNoNaN(rc);
  });

  it("a long cycle with many short episodes folds them into at most 12 findings per kind", () => {
    const raw = example("conventional");
    raw.engine.max_torque_nm.torque_nm = [40, 45, 45, 45, 42, 40];
    const speed: number[] = [];
    for (let rep = 0; rep < 200; rep++) speed.push(0, 0, 10, 20, 30, 30, 20, 10);
    speed.push(0);
    raw.cycle = { dt_s: 1, speed_kmh: speed };
    const r = evaluate(raw);
    const f = r.findings.filter((x) => x.code === "engine_torque_above_full_load");
    expect(f.length).toBeLessThanOrEqual(12);
    expect(f.reduce((a, x) => a + x.steps, 0)).toBeLessThanOrEqual(r.kpi.infeasible_steps);
    expect(f.at(-1)!.message).toMatch(/episodes between/);
    expectNoNaN(r);
  });

  it("a standstill-only cycle gives null per-km figures instead of NaN", () => {
    const raw = example("conventional");
    raw.cycle = { dt_s: 1, speed_kmh: [0, 0, 0] };
    const r = evaluate(raw);
    expect(r.kpi.fuel_l_per_100km).toBeNull();
    expect(r.kpi.fuel_g).toBeGreaterThan(0);
    expectNoNaN(r);
  });
});

describe("sanity warnings", () => {
  it("flags a hybrid that is not charge-sustaining and SOC pinned at a bound", () => {
    const raw = example("series");
    raw.strategy = { kind: "thermostat", soc_on: 0.3, soc_off: 0.35, on_power_kw: 5 };
    raw.battery.soc_initial = 0.8;
    const r = evaluate(raw);
    expect(r.findings.some((x) => x.code === "not_charge_sustaining")).toBe(true);
    const p = example("parallel");
    p.battery.soc_initial = p.battery.soc_max;
    p.strategy = { kind: "rule", electric_speed_max_kmh: 0, soc_low: 0.79, soc_high: 0.8, charge_power_kw: 0 };
    p.cycle = { standard: "eudc" };
    const rp = evaluate(p);
    expect(rp.findings.some((x) => x.code === "soc_pinned_high")).toBe(true);
  });

  it("warns about unused blocks and unusual parameter values", () => {
    const raw = example("bev");
    raw.engine = example("conventional").engine;
    raw.vehicle.rolling_resistance = 0.03;
    const r = evaluate(raw);
    expect(r.findings.some((x) => x.code === "unused_block" && x.component === "engine")).toBe(true);
    expect(r.findings.some((x) => x.code === "suspicious_parameter")).toBe(true);
  });
});
