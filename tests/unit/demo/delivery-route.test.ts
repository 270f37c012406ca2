import Fraction from "fraction.js";
import { describe, expect, it } from "vitest";
import { DELIVERY_ROUTE, routeFigures, routeSpeedsText, sampleRoute, type Section } from "@/lib/demo/delivery-route";
import { parseList } from "@/lib/notebook/lists";
import { evaluateScenarioInput } from "@/lib/engine";

/**
 * The exact integral of the phases, in rational arithmetic, straight from the phase list (not
 * from the samples): a ramp from v0 to v1 at a lasts (v1 − v0)/(3.6·a) s and covers
 * (v0 + v1)/2 · t; a cruise covers v · t. Speeds in km/h, so divide by 3.6 for m/s.
 */
function exactIntegral(route: readonly Section[]): { duration_s: Fraction; distance_m: Fraction } {
  let v = new Fraction(0);
  let duration = new Fraction(0);
  let distance = new Fraction(0);
  const kmh = new Fraction(36, 10);
  for (const section of route)
    for (const p of section.phases) {
      if (p.kind === "dwell") duration = duration.add(new Fraction(p.duration_s));
      else if (p.kind === "cruise") {
        duration = duration.add(new Fraction(p.duration_s));
        distance = distance.add(v.div(kmh).mul(p.duration_s));
      } else {
        const to = new Fraction(p.to_kmh);
        const t = to.sub(v).abs().div(kmh).div(new Fraction(p.a_m_s2));
        duration = duration.add(t);
        distance = distance.add(v.add(to).div(2).div(kmh).mul(t));
        v = to;
      }
    }
  return { duration_s: duration, distance_m: distance };
}

function trapezoid_m(speed_kmh: readonly number[], dt_s: number): number {
  let d = 0;
  for (let k = 0; k + 1 < speed_kmh.length; k++) d += ((speed_kmh[k] + speed_kmh[k + 1]) / 2 / 3.6) * dt_s;
  return d;
}

describe("delivery route generator", () => {
  const route = sampleRoute();
  const exact = exactIntegral(DELIVERY_ROUTE);

  it("lasts exactly as long as its phases, one sample per second", () => {
    expect(exact.duration_s.d).toBe(1n); // every phase ends on a whole second
    expect(route.speed_kmh.length - 1).toBe(Number(exact.duration_s.n));
    // the brief for the demo: a 1200–2400 s urban round (invented for the demo)
    expect(route.speed_kmh.length - 1).toBeGreaterThanOrEqual(1200);
    expect(route.speed_kmh.length - 1).toBeLessThanOrEqual(2400);
  });

  it("covers exactly the integral of its phases", () => {
    const exact_m = exact.distance_m.valueOf();
    expect(Math.abs(trapezoid_m(route.speed_kmh, 1) - exact_m)).toBeLessThan(1e-9 * exact_m);
    expect(Math.abs(routeFigures(route).distance_km * 1000 - exact_m)).toBeLessThan(1e-9 * exact_m);
  });

  it("never asks for more than the stated rates (largest stated: 1.25 m/s²)", () => {
    const stated = new Set(DELIVERY_ROUTE.flatMap((s) => s.phases.flatMap((p) => ("a_m_s2" in p ? [p.a_m_s2] : []))));
    for (let k = 0; k + 1 < route.speed_kmh.length; k++) {
      const a = Math.abs(route.speed_kmh[k + 1] - route.speed_kmh[k]) / 3.6;
      if (a === 0) continue;
      expect([...stated].some((s) => Math.abs(s - a) < 1e-9), `step ${k}: ${a} m/s²`).toBe(true);
    }
  });

  it("has many stops, a ring-road stretch and starts and ends at rest", () => {
    const f = routeFigures(route);
    expect(f.stops).toBeGreaterThanOrEqual(20);
    expect(f.max_kmh).toBe(81);
    expect(route.speed_kmh[0]).toBe(0);
    expect(route.speed_kmh.at(-1)).toBe(0);
  });

  it("reads back from the list text unchanged", () => {
    const parsed = parseList(routeSpeedsText(route), { quantity: "speed", unit: "km/h" });
    expect(parsed.ok).toBe(true);
    if (parsed.ok) expect(parsed.values).toEqual(route.speed_kmh);
  });

  it("gives the engine the same distance", () => {
    const out = evaluateScenarioInput({
      format: "joulebook.scenario/1", powertrain: "bev",
      cycle: { dt_s: 1, speed_kmh: route.speed_kmh },
      vehicle: { mass_kg: 3000, rotating_mass_factor: 0.05, drag_coefficient: 0.37, frontal_area_m2: 4.7, rolling_resistance: 0.01, wheel_radius_m: 0.345 },
      driveline: { gear_ratios: [1], final_drive_ratio: 10, efficiency: 0.97 },
      motor: { peak_power_kw: 120, peak_torque_nm: 300, max_speed_rpm: 12000, efficiency: 0.9 },
      battery: { capacity_ah: 250, ocv: { soc: [0, 1], voltage_v: [320, 400] }, resistance_ohm: 0.05, soc_initial: 0.9, soc_min: 0.1, soc_max: 0.95, max_discharge_c: 3, max_charge_c: 1 },
    });
    if (!out.ok) throw new Error(JSON.stringify(out.errors));
    const exact_km = exact.distance_m.valueOf() / 1000;
    expect(Math.abs(out.result.kpi.distance_km - exact_km)).toBeLessThan(1e-9 * exact_km);
  });

  it("refuses phases that do not fit the 1 s grid or the state of the van, naming where", () => {
    const bad = (phases: Section["phases"]) => () => sampleRoute([{ label: "test lane", phases }]);
    // 0 → 30 km/h at 1 m/s² lasts 8.33 s
    expect(bad([{ kind: "accelerate", to_kmh: 30, a_m_s2: 1 }, { kind: "decelerate", to_kmh: 0, a_m_s2: 1 }])).toThrow(/test lane.*phase 1 \(accelerate\).*not a whole number/);
    expect(bad([{ kind: "accelerate", to_kmh: 36, a_m_s2: 1 }, { kind: "dwell", duration_s: 5 }])).toThrow(/phase 2 \(dwell\).*at rest/);
    expect(bad([{ kind: "cruise", duration_s: 5 }])).toThrow(/cruise at 0 km\/h/);
    expect(bad([{ kind: "accelerate", to_kmh: 36, a_m_s2: 1 }])).toThrow(/must end at rest/);
    expect(bad([{ kind: "decelerate", to_kmh: 0, a_m_s2: 1 }])).toThrow(/wrong way/);
    expect(bad([{ kind: "accelerate", to_kmh: 36, a_m_s2: 0 }])).toThrow(/positive number/);
    expect(bad([{ kind: "dwell", duration_s: 2.5 }])).toThrow(/not a positive whole number/);
  });
});
