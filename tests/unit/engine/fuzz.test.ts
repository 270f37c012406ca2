import { describe, expect, it } from "vitest";
import { evaluateScenarioInput } from "@/lib/engine";
import { POWERTRAINS, example, walkNumbers } from "./helpers";

/** Small deterministic PRNG (mulberry32), so a failure can be replayed from its seed. */
function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Keys whose values are kept: SOC fractions, speed breakpoints and the gear schedule. */
const KEEP = /soc|speed_rpm|upshift|format/;

/**
 * Scales every free number by a random factor in [0.05, 20] (arrays by one factor, so their
 * order survives); efficiencies stay in (0, 1]. One value in fifty is set to 0 or negated
 * to exercise the validation path as well.
 */
function mutate(value: unknown, rand: () => number, key = ""): unknown {
  if (KEEP.test(key)) return value;
  const factor = () => Math.exp((rand() - 0.5) * 2 * Math.log(20));
  if (typeof value === "number") {
    const r = rand();
    if (r < 0.01) return -value;
    if (r < 0.02) return 0;
    const v = value * factor();
    return /efficiency/.test(key) ? Math.min(1, v) : v;
  }
  if (Array.isArray(value)) {
    const f = factor();
    return value.map((v) => (typeof v === "number" ? v * f : v));
  }
  if (value && typeof value === "object") return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, mutate(v, rand, k)]));
  return value;
}

describe("fuzz: wild parameter values never throw and never give NaN", () => {
  for (const p of POWERTRAINS)
    it(`${p}: 60 random scenarios`, () => {
      const rand = rng(1000 + p.length);
      let evaluated = 0;
      for (let i = 0; i < 60; i++) {
        const raw = mutate(example(p), rand) as Record<string, unknown>;
        raw.cycle = { standard: "ece15" };
        const out = evaluateScenarioInput(raw);
        if (!out.ok) {
          for (const e of out.errors) expect(e.message.length).toBeGreaterThan(0);
          continue;
        }
        evaluated++;
        for (const [path, v] of walkNumbers(out.result)) if (!Number.isFinite(v)) throw new Error(`seed ${i}: ${path} = ${v}`);
        const scale = Object.values(out.result.ledger_j).reduce((a, b) => a + Math.abs(b), 0);
        expect(Math.abs(out.result.closure_error_j)).toBeLessThanOrEqual(1e-9 * scale + 1e-6);
      }
      expect(evaluated).toBeGreaterThan(20);
    });
});

describe("fuzz: random custom cycles (steep grades, high speeds, jumps)", () => {
  for (const p of POWERTRAINS)
    it(`${p}: 25 random cycles`, () => {
      const rand = rng(77 + p.length);
      for (let i = 0; i < 25; i++) {
        const n = 2 + Math.floor(rand() * 300);
        const top = 10 + rand() * 250;
        const speed = Array.from({ length: n }, () => (rand() < 0.2 ? 0 : rand() * top));
        const grade = Array.from({ length: n }, () => (rand() - 0.5) * 40);
        const raw = example(p);
        raw.cycle = { dt_s: 0.2 + rand() * 3, speed_kmh: speed, grade_pct: grade };
        const out = evaluateScenarioInput(raw);
        if (!out.ok) throw new Error(out.errors[0].message);
        for (const [path, v] of walkNumbers(out.result)) if (!Number.isFinite(v)) throw new Error(`cycle ${i}: ${path} = ${v}`);
        const scale = Object.values(out.result.ledger_j).reduce((a, b) => a + Math.abs(b), 0);
        expect(Math.abs(out.result.closure_error_j)).toBeLessThanOrEqual(1e-9 * scale + 1e-6);
        expect(out.result.kpi.feasible).toBe(out.result.findings.every((f) => f.severity !== "infeasible"));
      }
    });
});
