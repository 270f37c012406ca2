import { describe, expect, it } from "vitest";
import Fraction from "fraction.js";
import { buildStandardCycle, cycleStats, buildCustomCycle } from "@/lib/engine/cycles";

// Exact distance of a piecewise-linear profile, from the R83 operation tables transcribed
// again here (independently of lib/engine/cycles/r83-tables.ts): Σ (v0 + v1)/2 · t / 3.6.
// Rows: [from km/h, to km/h, duration s] of UNECE R83 Annex 4a Table 1 (ECE-15) and Table 2 (EUDC).
const ECE_ROWS: [number, number, number][] = [
  [0, 0, 11], [0, 15, 4], [15, 15, 8], [15, 10, 2], [10, 0, 3], [0, 0, 21], [0, 15, 5], [15, 15, 2], [15, 32, 5],
  [32, 32, 24], [32, 10, 8], [10, 0, 3], [0, 0, 21], [0, 15, 5], [15, 15, 2], [15, 35, 9], [35, 35, 2], [35, 50, 8],
  [50, 50, 12], [50, 35, 8], [35, 35, 13], [35, 32, 2], [32, 10, 7], [10, 0, 3], [0, 0, 7],
];
const EUDC_ROWS: [number, number, number][] = [
  [0, 0, 20], [0, 15, 5], [15, 15, 2], [15, 35, 9], [35, 35, 2], [35, 50, 8], [50, 50, 2], [50, 70, 13], [70, 70, 50],
  [70, 50, 8], [50, 50, 69], [50, 70, 13], [70, 70, 50], [70, 100, 35], [100, 100, 30], [100, 120, 20], [120, 120, 10],
  [120, 80, 16], [80, 50, 8], [50, 0, 10], [0, 0, 20],
];

function exactDistance_m(rows: [number, number, number][]): Fraction {
  return rows.reduce((acc, [a, b, t]) => acc.add(new Fraction(a + b).mul(t).div(2).div(new Fraction(36, 10))), new Fraction(0));
}

const CAR = { inertial_mass_kg: 1500, mass_kg: 1500, drag_area_m2: 0.66, air_density_kg_m3: 1.225, rolling_resistance: 0.012, gravity_m_s2: 9.80665 };
const stats = (name: "ece15" | "eudc" | "nedc", dt = 1) => cycleStats(buildStandardCycle(name, dt), CAR);

describe("standard cycles rebuilt from UNECE R83 Annex 4a", () => {
  it("exact rebuild distances equal the rational values in REFERENCES.md", () => {
    // REFERENCES.md: ECE-15 12175/12 m, EUDC 250375/36 m, NEDC 396475/36 m.
    const ece = exactDistance_m(ECE_ROWS);
    const eudc = exactDistance_m(EUDC_ROWS);
    expect(ece.equals(new Fraction(12175, 12))).toBe(true);
    expect(eudc.equals(new Fraction(250375, 36))).toBe(true);
    expect(ece.mul(4).add(eudc).equals(new Fraction(396475, 36))).toBe(true);
  });

  it.each([
    ["ece15", ECE_ROWS, 195],
    ["eudc", EUDC_ROWS, 400],
  ] as const)("%s: sampled cycle integrates to the exact rebuild distance at several dt", (name, rows, duration) => {
    const exact = exactDistance_m(rows as [number, number, number][]).valueOf();
    for (const dt of [1, 0.5, 0.25]) {
      const s = stats(name, dt);
      expect(s.duration_s).toBeCloseTo(duration, 9);
      expect(Math.abs(s.distance_m - exact) / exact).toBeLessThan(1e-12);
    }
  });

  it("NEDC = 4 × ECE-15 + EUDC: exact distance and 1180 s", () => {
    const s = stats("nedc");
    expect(s.duration_s).toBe(1180);
    expect(Math.abs(s.distance_m - 396475 / 36) / (396475 / 36)).toBeLessThan(1e-12);
  });

  it("distance, duration, mean and max speed match R83's published figures within 0.2 %", () => {
    // Published (REFERENCES.md, R83): ECE-15 195 s, 1.013 km, 18.7 km/h mean, 50 max;
    // EUDC 400 s, 6.955 km, 62.6 mean, 120 max; NEDC 1180 s, 11.007 km, 33.6 mean, 120 max.
    const published = {
      ece15: [195, 1.013, 18.7, 50],
      eudc: [400, 6.955, 62.6, 120],
      nedc: [1180, 11.007, 33.6, 120],
    } as const;
    for (const [name, [t, km, mean, max]] of Object.entries(published)) {
      const s = stats(name as "ece15");
      expect(s.duration_s).toBe(t);
      expect(Math.abs(s.distance_km - km) / km).toBeLessThan(0.002);
      expect(Math.abs(s.mean_speed_kmh - mean) / mean).toBeLessThan(0.002 + 0.05 / mean); // published mean is rounded to 0.1
      expect(s.max_speed_kmh).toBeCloseTo(max, 9);
    }
  });

  it("counts stops and time shares", () => {
    const ece = stats("ece15");
    expect(ece.stops).toBe(3); // three decelerations to rest, R83 Table 1 ops 5, 12, 24
    // idle operations 1, 6, 13, 25: 11 + 21 + 21 + 7 = 60 s of 195 s (R83 Table 1)
    expect(ece.idle_share).toBeCloseTo(60 / 195, 12);
    // steady + gear-change at constant speed: 8 + 2 + 24 + 2 + 2 + 12 + 13 = 63 s
    expect(ece.cruise_share).toBeCloseTo(63 / 195, 12);
    expect(ece.idle_share + ece.accel_share + ece.cruise_share + ece.decel_share).toBeCloseTo(1, 12);
    expect(stats("nedc").stops).toBe(13);
  });
});

describe("positive-traction coefficients (REFERENCES.md closed-form oracles)", () => {
  it.each([
    // REFERENCES.md: m = 1500 kg, c_r = 0.012, CdA = 0.66 m², ρ = 1.225, g = 9.80665
    ["nedc", 314.36, 0.8482, 0.1114],
    ["ece15", 81.37, 0.7832, 0.1426],
    ["eudc", 450.32, 0.8862, 0.0932],
  ] as const)("%s: x_aero, x_roll, x_m", (name, xa, xr, xm) => {
    const s = stats(name);
    expect(s.x_aero_m2_s2).toBeCloseTo(xa, 2);
    expect(s.x_roll).toBeCloseTo(xr, 4);
    expect(s.x_m_m_s2).toBeCloseTo(xm, 4);
  });

  it("the NEDC traction energy terms reproduce the published joules", () => {
    // REFERENCES.md: aero 1,399,576 J + rolling 1,648,964 J + inertia 1,840,046 J = 4,888,586 J.
    const s = stats("nedc");
    const D = s.distance_m;
    const aero = 0.5 * 1.225 * 0.66 * s.x_aero_m2_s2 * D;
    const roll = 1500 * 9.80665 * 0.012 * s.x_roll * D;
    const inertia = 1500 * s.x_m_m_s2 * D;
    expect(Math.abs(aero - 1_399_576) / 1_399_576).toBeLessThan(2e-6);
    expect(Math.abs(roll - 1_648_964) / 1_648_964).toBeLessThan(2e-6);
    expect(Math.abs(inertia - 1_840_046) / 1_840_046).toBeLessThan(2e-6);
  });
});

describe("custom cycles", () => {
  it("keeps samples, converts grade to an angle, and trapezoid distance", () => {
    const c = buildCustomCycle(2, [0, 36, 36, 0], [0, 5, 5, 0]);
    expect(c.speed_m_s[1]).toBeCloseTo(10, 12);
    expect(c.grade_rad![1]).toBeCloseTo(Math.atan(0.05), 15);
    const s = cycleStats(c, CAR);
    expect(s.distance_m).toBeCloseTo(2 * (5 + 10 + 5), 10);
    expect(s.stops).toBe(0); // ends at rest but no standstill interval follows
  });
});
