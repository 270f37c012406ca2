import { describe, expect, it } from "vitest";
import { evaluateScenario, SINK_KEYS, SUPPLY_KEYS, prepare, type Result } from "@/lib/engine";
import { S_AUX_W, S_BATT_CURRENT_A, S_BATT_OCV_V, S_BATTERY_LOSS_W, S_BRAKES_W, S_CLUTCH_W, S_DRIVELINE_W, S_ENGINE_LOSS_W, S_FUEL_W, S_GENERATOR_LOSS_W, S_MOTOR_LOSS_W, S_UNMET_W, newStepScratch } from "@/lib/engine/step-output";
import { POWERTRAINS, example, parsed } from "./helpers";

/** A hilly custom cycle at 0.5 s, rest to rest (common practice, no source: a test profile). */
function hillyCycle() {
  const speed: number[] = [];
  const grade: number[] = [];
  for (let k = 0; k <= 1200; k++) {
    const t = k * 0.5;
    speed.push(k === 0 || k === 1200 ? 0 : Math.max(0, 60 * Math.sin((Math.PI * t) / 600) + 8 * Math.sin(t / 9)));
    grade.push(4 * Math.sin(t / 40));
  }
  return { dt_s: 0.5, speed_kmh: speed, grade_pct: grade };
}

const CYCLES: [string, unknown][] = [
  ["ECE-15", { standard: "ece15" }],
  ["EUDC", { standard: "eudc" }],
  ["NEDC at 0.5 s", { standard: "nedc", dt_s: 0.5 }],
  ["hilly custom at 0.5 s", hillyCycle()],
];

function run(powertrain: string, cycle: unknown): Result {
  const raw = example(powertrain);
  raw.cycle = cycle;
  const out = evaluateScenario(parsed(raw));
  if (!out.ok) throw new Error(out.errors[0].message);
  return out.result;
}

function relativeClosure(r: Result): number {
  let scale = 0;
  for (const k of [...SUPPLY_KEYS, ...SINK_KEYS]) scale += Math.abs(r.ledger_j[k]);
  return Math.abs(r.closure_error_j) / scale;
}

describe("loss ledger closes (DESIGN §4 identity)", () => {
  for (const p of POWERTRAINS)
    for (const [label, cycle] of CYCLES)
      it(`${p} on ${label}: relative closure < 1e-9, every term finite`, () => {
        const r = run(p, cycle);
        expect(relativeClosure(r)).toBeLessThan(1e-9);
        for (const v of Object.values(r.ledger_j)) expect(Number.isFinite(v)).toBe(true);
        for (const k of ["aero", "rolling", "friction_brakes", "driveline", "clutch", "engine", "motor", "generator", "battery_internal", "auxiliaries"] as const)
          expect(r.ledger_j[k]).toBeGreaterThanOrEqual(-1e-6);
      });

  it("each step closes on its own, for every candidate control of the hybrids", () => {
    for (const p of POWERTRAINS) {
      const s = parsed(example(p));
      const { plant, demand } = prepare(s);
      const out = newStepScratch();
      const ctl = new Float64Array(2);
      for (let k = 0; k < demand.n; k += 7) {
        const cnt = plant.candidateCount(k, 9);
        for (let j = 0; j < cnt; j++) {
          plant.candidate(k, j, 9, ctl);
          plant.apply(k, 0.55, ctl[0], ctl[1], out);
          const supply = out[S_FUEL_W] + out[S_BATT_OCV_V] * out[S_BATT_CURRENT_A] + out[S_UNMET_W];
          const sinks = demand.wheel_w[k] + out[S_BRAKES_W] + out[S_DRIVELINE_W] + out[S_CLUTCH_W] + out[S_ENGINE_LOSS_W] +
            out[S_MOTOR_LOSS_W] + out[S_GENERATOR_LOSS_W] + out[S_BATTERY_LOSS_W] + out[S_AUX_W];
          expect(Math.abs(supply - sinks)).toBeLessThanOrEqual(1e-9 * (Math.abs(supply) + Math.abs(sinks) + 1));
        }
      }
    }
  });
});

describe("per-step ledger in the Result", () => {
  it("each step of every powertrain closes and the steps sum to the totals", () => {
    for (const p of POWERTRAINS) {
      const out = evaluateScenario(parsed(example(p)), { stepLedger: true });
      if (!out.ok) throw new Error();
      const r = out.result;
      const sl = r.step_ledger_w!;
      const dt = r.cycle.dt_s;
      for (let k = 0; k < r.cycle.steps; k++) {
        let supply = 0, sinks = 0, scale = 0;
        for (const key of SUPPLY_KEYS) { supply += sl[key][k]; scale += Math.abs(sl[key][k]); }
        for (const key of SINK_KEYS) { sinks += sl[key][k]; scale += Math.abs(sl[key][k]); }
        expect(Math.abs(supply - sinks)).toBeLessThanOrEqual(1e-12 * scale + 1e-9);
      }
      for (const key of [...SUPPLY_KEYS, ...SINK_KEYS]) {
        const total = sl[key].reduce((a, b) => a + b, 0) * dt;
        expect(Math.abs(total - r.ledger_j[key])).toBeLessThanOrEqual(1e-9 * (Math.abs(r.ledger_j[key]) + 1));
      }
      const plain = evaluateScenario(parsed(example(p)));
      expect(plain.ok && "step_ledger_w" in plain.result).toBe(false); // off by default

    }
  });
});

describe("ledger identities (REFERENCES.md)", () => {
  it("inertial work over a rest-to-rest cycle sums to zero", () => {
    for (const [, cycle] of CYCLES) {
      const r = run("conventional", cycle);
      expect(Math.abs(r.ledger_j.kinetic)).toBeLessThan(1e-9 * r.ledger_j.fuel);
    }
  });

  it("kinetic work equals ½·m(1+f)·v² when the cycle ends moving: 1500 kg to 50 km/h → 144,675.9 J", () => {
    const raw = example("bev");
    raw.vehicle = { ...raw.vehicle, mass_kg: 1500, rotating_mass_factor: 0 };
    raw.cycle = { dt_s: 1, speed_kmh: [0, 10, 20, 30, 40, 50] };
    const out = evaluateScenario(parsed(raw));
    if (!out.ok) throw new Error();
    expect(out.result.ledger_j.kinetic).toBeCloseTo(144_675.9, 1);
  });

  it("rolling work = m·g·c_r·distance on a level road", () => {
    const s = parsed(example("bev"));
    const r = run("bev", { standard: "nedc" });
    const v = s.vehicle;
    expect(r.ledger_j.rolling / (v.mass_kg * v.gravity_m_s2 * v.rolling_resistance * r.kpi.distance_km * 1000)).toBeCloseTo(1, 12);
  });

  it("auxiliaries = aux power × duration; aero matches ½ρ·CdA·Σv̄³·dt", () => {
    const r = run("series", { standard: "eudc" });
    expect(r.ledger_j.auxiliaries).toBeCloseTo(300 * 400, 6);
    const s = parsed(example("series"));
    const v = s.vehicle;
    let sum = 0;
    for (const x of r.traces.speed_kmh) sum += (x / 3.6) ** 3;
    expect(r.ledger_j.aero / (0.5 * v.air_density_kg_m3 * v.drag_coefficient * v.frontal_area_m2 * sum)).toBeCloseTo(1, 12);
  });

  it("battery_net equals the SOC change times charge times mean OCV (bev, flat OCV)", () => {
    const raw = example("bev");
    raw.battery = { ...raw.battery, ocv: { soc: [0, 1], voltage_v: [350, 350] } };
    const r = evaluateScenario(parsed(raw));
    if (!r.ok) throw new Error();
    const q = raw.battery.capacity_ah * 3600;
    const dSoc = r.result.kpi.soc_initial! - r.result.kpi.soc_final!;
    expect(r.result.ledger_j.battery_net).toBeCloseTo(350 * q * dSoc, 3);
  });
});
