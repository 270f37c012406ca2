import { describe, expect, it } from "vitest";
import { polynomialRoot } from "mathjs";
import { roadLoadForce_n, roadLoadPowers, type RoadLoadParams } from "@/lib/engine/models/road-load";
import { Battery } from "@/lib/engine/models/battery";
import { WillansEngine } from "@/lib/engine/models/willans-engine";
import { ElectricMachine } from "@/lib/engine/models/electric-machine";
import { scheduledGear } from "@/lib/engine/models/gear-schedule";
import { FullLoadCurve } from "@/lib/engine/models/full-load-curve";
import { kmhToMs, rpmToRadS } from "@/lib/engine/units";

// REFERENCES.md closed-form oracle: m = 1500 kg, c_r = 0.012, CdA = 0.66 m², ρ = 1.225, g = 9.80665.
const CAR: RoadLoadParams = { mass_kg: 1500, inertial_mass_kg: 1500, drag_area_m2: 0.66, air_density_kg_m3: 1.225, rolling_resistance: 0.012, gravity_m_s2: 9.80665 };

describe("road load", () => {
  it("constant 100 km/h: aero 311.921 N + rolling 176.520 N = 488.441 N → 13.568 kW (REFERENCES.md)", () => {
    const v = kmhToMs(100);
    const p = { aero_w: 0, rolling_w: 0, grade_w: 0, inertia_w: 0 };
    roadLoadPowers(CAR, v, 0, 0, p);
    expect(p.aero_w / v).toBeCloseTo(311.921, 3);
    expect(p.rolling_w / v).toBeCloseTo(176.52, 3);
    expect(roadLoadForce_n(CAR, v, 0, 0)).toBeCloseTo(488.441, 3);
    expect((p.aero_w + p.rolling_w) / 1000).toBeCloseTo(13.568, 3);
  });

  it("a 5 % grade adds m·g·sin(atan 0.05) = 734.581 N (REFERENCES.md)", () => {
    const v = kmhToMs(100);
    const alpha = Math.atan(0.05);
    const extra = roadLoadForce_n(CAR, v, 0, alpha) - roadLoadForce_n(CAR, v, 0, 0);
    // rolling on the slope scales with cos α, so compare the grade term itself
    const p = { aero_w: 0, rolling_w: 0, grade_w: 0, inertia_w: 0 };
    roadLoadPowers(CAR, v, 0, alpha, p);
    expect(p.grade_w / v).toBeCloseTo(734.581, 3);
    expect(extra).toBeCloseTo(734.581 - 176.52 * (1 - Math.cos(alpha)), 3);
  });

  it("is zero at standstill even on a slope (DESIGN §4)", () => {
    expect(roadLoadForce_n(CAR, 0, 0, 0.1)).toBe(0);
  });
});

describe("OCV–R battery", () => {
  const spec = { capacity_ah: 30, ocv: { soc: [0, 1], voltage_v: [300, 300] }, resistance_ohm: 0.1, soc_initial: 0.5, soc_min: 0.1, soc_max: 0.9, max_discharge_c: 100, max_charge_c: 100 };
  const b = new Battery(spec);

  it("50 kW at 300 V, 0.1 Ω: I = 177.1243 A, terminal 282.2876 V, loss 3137.30 W (REFERENCES.md)", () => {
    const i = b.current_a(300, 50_000);
    expect(i).toBeCloseTo(177.1243, 4);
    expect(300 - 0.1 * i).toBeCloseTo(282.2876, 4);
    expect(0.1 * i * i).toBeCloseTo(3137.3, 2);
  });

  it("−30 kW: I = −96.8719 A, loss 938.42 W (REFERENCES.md)", () => {
    const i = b.current_a(300, -30_000);
    expect(i).toBeCloseTo(-96.8719, 4);
    expect(0.1 * i * i).toBeCloseTo(938.42, 2);
  });

  it("P_max = U²/(4R) = 225 kW at I = U/(2R) = 1500 A (REFERENCES.md)", () => {
    expect(b.maxPower_w(300)).toBeCloseTo(225_000, 6);
    expect(b.current_a(300, 225_000)).toBeCloseTo(1500, 6);
  });

  it("current agrees with mathjs polynomialRoot of R·I² − U·I + P = 0 (smaller root)", () => {
    for (const [u, p] of [[300, 50_000], [360, 120_000], [250, -40_000], [400, 1], [320, 250_000]]) {
      const roots = (polynomialRoot(p, -u, 0.1) as unknown[]).map((r) => (typeof r === "number" ? r : NaN)).filter(Number.isFinite);
      const expected = Math.min(...roots);
      expect(Math.abs(b.current_a(u, p) - expected)).toBeLessThan(1e-9 * Math.max(1, Math.abs(expected)));
    }
  });

  it("discharge and charge limits respect C-rate and the SOC window within a step", () => {
    const b2 = new Battery({ ...spec, max_discharge_c: 2, max_charge_c: 1 });
    const pd = b2.dischargeLimit_w(0.5, 1);
    expect(b2.current_a(300, pd)).toBeCloseTo(60, 9); // 2 C of 30 Ah
    const pc = b2.chargeLimit_w(0.5, 1);
    expect(b2.current_a(300, pc)).toBeCloseTo(-30, 9);
    // 1 s before soc_max: at most (0.9 − 0.8999)·30·3600 C can go in
    expect(-b2.current_a(300, b2.chargeLimit_w(0.8999, 1))).toBeCloseTo(0.0001 * 30 * 3600, 6);
    expect(b2.chargeLimit_w(0.9, 1)).toBe(0);
  });

  it("OCV interpolates linearly and holds outside the table", () => {
    const b3 = new Battery({ ...spec, ocv: { soc: [0, 0.5, 1], voltage_v: [320, 360, 400] } });
    expect(b3.ocv_v(0.25)).toBeCloseTo(340, 12);
    expect(b3.ocv_v(-0.1)).toBe(320);
    expect(b3.ocv_v(1.2)).toBe(400);
  });
});

describe("Willans engine", () => {
  it("V_d = 2 L, 2000 rpm, p_me0 = 1.5 bar, e = 0.4, P_e = 20 kW (REFERENCES.md worked example)", () => {
    const e = new WillansEngine({
      displacement_l: 2, willans_efficiency: 0.4, friction_mep_bar: 1.5, idle_speed_rpm: 800, max_speed_rpm: 6000,
      max_torque_nm: { speed_rpm: [800, 6000], torque_nm: [200, 200] }, fuel: { lhv_mj_kg: 43, density_kg_l: 0.745, co2_kg_l: 2.31 },
    });
    const w = rpmToRadS(2000);
    expect(e.frictionPower_w(w)).toBeCloseTo(5000, 6);
    const pf = e.fuelPower_w(20_000, w);
    expect(pf).toBeCloseTo(62_500, 6);
    expect(pf / e.lhv_j_per_g).toBeCloseTo(1.45349, 5);
    expect(20_000 / pf).toBeCloseTo(0.32, 12);
  });
});

describe("electric machine, gear schedule, full-load curve", () => {
  it("torque limit is min(T_peak, P_peak/ω); electrical power P/η and P·η", () => {
    const m = new ElectricMachine({ peak_power_kw: 50, peak_torque_nm: 200, max_speed_rpm: 12000, efficiency: 0.9 });
    expect(m.torqueLimit_nm(100)).toBe(200);
    expect(m.torqueLimit_nm(500)).toBeCloseTo(100, 12);
    expect(m.electrical_w(900)).toBeCloseTo(1000, 12);
    expect(m.electrical_w(-1000)).toBeCloseTo(-900, 12);
  });

  it("gear = 1 + count(mean speed ≥ threshold) (DESIGN §3)", () => {
    const th = [15, 30, 50, 70];
    expect([0, 14.99, 15, 29, 30, 69.9, 70, 130].map((v) => scheduledGear(v, th))).toEqual([1, 1, 2, 2, 3, 4, 5, 5]);
  });

  it("full-load curve interpolates piecewise-linearly in speed", () => {
    const c = new FullLoadCurve([1000, 2000, 4000], [100, 140, 120]);
    expect(c.torqueAt(rpmToRadS(1500))).toBeCloseTo(120, 10);
    expect(c.torqueAt(rpmToRadS(3000))).toBeCloseTo(130, 10);
    expect(c.torqueAt(rpmToRadS(500))).toBe(100);
    expect(c.torqueAt(rpmToRadS(9000))).toBe(120);
  });
});
