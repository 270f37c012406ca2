import { describe, expect, it } from "vitest";
import { evaluateScenarioInput } from "@/lib/engine";
import { POWERTRAINS, example, walkNumbers } from "./helpers";

/**
 * House rule (notes/common.md) and DESIGN §4: bad input gets a clear message, never NaN.
 * Closed-form reason these inputs are bad: the aero power ½ρ·c_d·A·v̄³ of 10^200 km/h and the
 * inertial power m·a·v̄ of a 10 km/h jump in 10^-306 s both exceed the largest double
 * (≈ 1.8·10^308), so Inf − Inf turns up in the sums.
 */
const ABSURD: [string, (raw: Record<string, any>) => void][] = [ // eslint-disable-line @typescript-eslint/no-explicit-any
  ["a speed of 1e200 km/h", (raw) => { raw.cycle = { dt_s: 1, speed_kmh: [0, 1e200, 0] }; }],
  ["dt_s = 1e-306 with a 10 km/h jump", (raw) => { raw.cycle = { dt_s: 1e-306, speed_kmh: [0, 10, 0] }; }],
  ["a mass of 1e308 kg", (raw) => { raw.vehicle.mass_kg = 1e308; raw.cycle = { dt_s: 1, speed_kmh: [0, 50, 0] }; }],
  // friction power p_me0·V_d·ω/(4π) with V_d = 1e306 L overflows at any speed (BEV: no engine block)
  ["an engine of 1e306 L", (raw) => { if (raw.engine) raw.engine.displacement_l = 1e306; raw.cycle = { dt_s: 1, speed_kmh: [0, 10, 0] }; }],
];

describe("review: absurd magnitudes give a message, never NaN", () => {
  for (const p of POWERTRAINS)
    for (const [label, apply] of ABSURD)
      it(`${p}: ${label}`, () => {
        const raw = example(p);
        apply(raw);
        const out = evaluateScenarioInput(raw);
        if (!out.ok) {
          expect(out.errors.length).toBeGreaterThan(0);
          for (const e of out.errors) expect(e.message).toMatch(/overflow/);
          return;
        }
        for (const [path, v] of walkNumbers(out.result)) if (!Number.isFinite(v)) throw new Error(`${path} = ${v}`);
      });
});
