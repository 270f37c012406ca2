import { describe, expect, it } from "vitest";
import { evaluateScenario, prepare, type Result } from "@/lib/engine";
import { MODE_ENGINE_OFF, MODE_ENGINE_ON } from "@/lib/engine/plants/plant";
import { S_BATT_CURRENT_A, S_BRAKES_W, S_CLUTCH_W, S_ENGINE_POWER_W, S_ENGINE_SPEED_RAD_S, S_ENGINE_TORQUE_NM, S_FUEL_W, S_MOTOR_POWER_W, S_VIOLATIONS, newStepScratch } from "@/lib/engine/step-output";
import { FullLoadCurve } from "@/lib/engine/models/full-load-curve";
import { rpmToRadS } from "@/lib/engine/units";
import { example, parsed } from "./helpers";

function evaluate(raw: unknown): Result {
  const out = evaluateScenario(parsed(raw));
  if (!out.ok) throw new Error(out.errors[0].message);
  return out.result;
}

describe("conventional (DESIGN §4 rules)", () => {
  const raw = example("conventional");
  const s = parsed(raw);
  const r = evaluate(raw);
  const e = s.engine!;
  const t = r.traces;
  const idle = rpmToRadS(e.idle_speed_rpm);
  const friction = (e.friction_mep_bar * 1e5 * e.displacement_l * 1e-3 * idle) / (4 * Math.PI);

  it("idles at standstill: P_e = aux, fuel = (aux + P_0(idle))/e", () => {
    const k = t.speed_kmh.findIndex((v) => v === 0);
    expect(t.engine_speed_rpm[k]).toBeCloseTo(e.idle_speed_rpm, 9);
    expect(t.engine_power_w[k]).toBeCloseTo(s.vehicle.aux_power_w, 9);
    expect(t.fuel_rate_g_s[k] * e.fuel.lhv_mj_kg * 1e3).toBeCloseTo((s.vehicle.aux_power_w + friction) / e.willans_efficiency, 6);
  });

  it("cuts fuel while braking above idle when the braking power covers the auxiliaries", () => {
    const { demand } = prepare(s);
    let checked = 0;
    for (let k = 0; k < demand.n; k++) {
      if (demand.moving[k] && demand.shaft_rad_s[k] >= idle && -demand.shaft_w[k] >= s.vehicle.aux_power_w) {
        expect(t.fuel_rate_g_s[k]).toBe(0);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(20);
  });

  it("slips the clutch only in traction below idle speed, with loss T·(ω_idle − ω)", () => {
    const { demand, plant } = prepare(s);
    const out = newStepScratch();
    let slipping = 0;
    for (let k = 0; k < demand.n; k++) {
      plant.apply(k, 0, MODE_ENGINE_ON, 0, out);
      const w = demand.shaft_rad_s[k];
      if (demand.moving[k] && demand.wheel_w[k] > 0 && w < idle) {
        slipping++;
        expect(out[S_CLUTCH_W]).toBeCloseTo((demand.shaft_w[k] / w) * (idle - w), 9);
        expect(out[S_ENGINE_SPEED_RAD_S]).toBe(idle);
      } else expect(out[S_CLUTCH_W]).toBe(0);
    }
    expect(slipping).toBeGreaterThan(0);
  });

  it("echoes the full-load curve and keeps engine torque under it on a feasible run", () => {
    expect(r.curves.engine_full_load).toEqual(e.max_torque_nm);
    const c = new FullLoadCurve(e.max_torque_nm.speed_rpm, e.max_torque_nm.torque_nm);
    t.engine_torque_nm.forEach((tq, k) => expect(tq).toBeLessThanOrEqual(c.torqueAt(rpmToRadS(t.engine_speed_rpm[k])) + 1e-9));
    expect(r.kpi.feasible).toBe(true);
  });

  it("fuel figures follow from the ledger and the fuel block", () => {
    const f = e.fuel;
    expect(r.kpi.fuel_g).toBeCloseTo(r.ledger_j.fuel / (f.lhv_mj_kg * 1e3), 9);
    expect(r.kpi.fuel_l_per_100km!).toBeCloseTo((r.kpi.fuel_g / 1000 / f.density_kg_l / r.kpi.distance_km) * 100, 12);
    expect(r.kpi.co2_g_per_km!).toBeCloseTo((r.kpi.fuel_l * f.co2_kg_l * 1000) / r.kpi.distance_km, 9);
  });
});

describe("battery-electric", () => {
  it("recuperates; a tighter charge-current limit moves braking energy to the friction brakes, never above the limit", () => {
    const raw = example("bev");
    const loose = evaluate(raw);
    raw.battery.max_charge_c = 0.1;
    const tight = evaluate(raw);
    expect(loose.ledger_j.friction_brakes).toBeLessThan(1e-6);
    expect(tight.ledger_j.friction_brakes).toBeGreaterThan(1e5);
    const limit = 0.1 * raw.battery.capacity_ah;
    for (const i of tight.traces.battery_current_a) expect(-i).toBeLessThanOrEqual(limit * (1 + 1e-9));
    expect(tight.kpi.feasible).toBe(true);
    expect(tight.ledger_j.battery_net).toBeGreaterThan(loose.ledger_j.battery_net);
  });

  it("does not charge above soc_max: regeneration feeds only the auxiliaries there", () => {
    const raw = example("bev");
    raw.battery.soc_initial = raw.battery.soc_max;
    raw.cycle = { dt_s: 1, speed_kmh: [50, 40, 30, 20, 10, 0] };
    const r = evaluate(raw);
    for (const x of [...r.traces.soc, r.kpi.soc_final!]) expect(x).toBeLessThanOrEqual(raw.battery.soc_max + 1e-12);
    expect(r.ledger_j.friction_brakes).toBeGreaterThan(0);
  });
});

describe("series hybrid with the thermostat", () => {
  it("switches with hysteresis: on at SOC ≤ soc_on, off at SOC ≥ soc_off, otherwise keeps its state", () => {
    const raw = example("series");
    const r = evaluate(raw);
    const { soc_on, soc_off } = raw.strategy;
    const on = r.traces.engine_on;
    let state = r.traces.soc[0] <= soc_on;
    r.traces.soc.forEach((x, k) => {
      if (x <= soc_on) state = true;
      else if (x >= soc_off) state = false;
      if (!state) expect(on[k]).toBe(0);
    });
    expect(on.some((x) => x === 1)).toBe(true);
  });

  it("runs the genset on the full-load curve at the lowest speed that gives the power", () => {
    const raw = example("series");
    const s = parsed(raw);
    const { plant } = prepare(s);
    const out = newStepScratch();
    const c = new FullLoadCurve(s.engine!.max_torque_nm.speed_rpm, s.engine!.max_torque_nm.torque_nm);
    plant.apply(0, 0.5, MODE_ENGINE_ON, 25_000, out);
    const w = out[S_ENGINE_SPEED_RAD_S];
    expect(out[S_ENGINE_POWER_W]).toBeCloseTo(25_000 / s.generator!.efficiency, 6);
    expect(out[S_ENGINE_TORQUE_NM]).toBeCloseTo(c.torqueAt(w), 6);
    // engine off at standstill: no fuel, the battery carries the auxiliaries
    plant.apply(0, 0.5, MODE_ENGINE_OFF, 0, out);
    expect(out[S_FUEL_W]).toBe(0);
    expect(out[S_BATT_CURRENT_A]).toBeGreaterThan(0);
  });

  it("offers DESIGN §4 candidates: off, then peak·j/(cp − 1)", () => {
    const s = parsed(example("series"));
    const { plant } = prepare(s);
    const ctl = new Float64Array(2);
    expect(plant.candidateCount(10, 5)).toBe(5);
    plant.candidate(10, 0, 5, ctl);
    expect(ctl[0]).toBe(MODE_ENGINE_OFF);
    plant.candidate(10, 1, 5, ctl);
    expect(ctl[1]).toBeCloseTo((s.generator!.peak_power_kw * 1000) / 4, 9);
    plant.candidate(10, 4, 5, ctl);
    expect(ctl[1]).toBeCloseTo(s.generator!.peak_power_kw * 1000, 9);
  });
});

describe("parallel hybrid", () => {
  const s = parsed(example("parallel"));
  const { plant, demand } = prepare(s);

  it("candidates span full generating torque to min(demand, full motoring torque)", () => {
    const ctl = new Float64Array(2);
    const k = demand.wheel_w.findIndex((p, i) => p > 5000 && demand.moving[i] === 1);
    expect(plant.candidateCount(k, 11)).toBe(12);
    const demandNm = demand.shaft_w[k] / demand.shaft_rad_s[k];
    const limit = Math.min(s.motor!.peak_torque_nm, (s.motor!.peak_power_kw * 1000) / demand.shaft_rad_s[k]);
    plant.candidate(k, 1, 11, ctl);
    expect(ctl[1]).toBeCloseTo(-limit, 9);
    plant.candidate(k, 11, 11, ctl);
    expect(ctl[1]).toBeCloseTo(Math.min(demandNm, limit), 9);
    const stand = demand.moving.findIndex((m) => m === 0);
    expect(plant.candidateCount(stand, 11)).toBe(1);
  });

  it("a motor torque beyond its limit is not eligible; within it, motor + engine carry the demand", () => {
    const out = newStepScratch();
    const k = demand.wheel_w.findIndex((p, i) => p > 5000 && demand.moving[i] === 1);
    plant.apply(k, 0.6, MODE_ENGINE_ON, -10_000, out);
    expect(out[S_VIOLATIONS]).not.toBe(0);
    plant.apply(k, 0.6, MODE_ENGINE_ON, -5, out);
    expect(out[S_VIOLATIONS]).toBe(0);
    expect(out[S_MOTOR_POWER_W] + out[S_ENGINE_POWER_W] - out[S_CLUTCH_W]).toBeCloseTo(demand.shaft_w[k], 6);
  });

  it("the rule drives electrically at low speed with SOC in the band, and brakes with the engine off", () => {
    const r = evaluate(example("parallel"));
    const lowSpeedTraction = r.traces.speed_kmh.map((v, k) => v > 0 && v <= 50 && r.traces.wheel_power_w[k] > 0 && r.traces.engine_on[k] === 0);
    expect(lowSpeedTraction.filter(Boolean).length).toBeGreaterThan(50);
    r.traces.wheel_power_w.forEach((p, k) => {
      if (p < 0) expect(r.traces.fuel_rate_g_s[k]).toBe(0);
    });
    expect(r.kpi.feasible).toBe(true);
  });

  it("electric drive brakes no fuel and books braking at the wheels: brake power ≥ 0", () => {
    const out = newStepScratch();
    for (let k = 0; k < demand.n; k++) {
      plant.apply(k, 0.6, MODE_ENGINE_OFF, 0, out);
      expect(out[S_BRAKES_W]).toBeGreaterThanOrEqual(-1e-9);
    }
  });
});
