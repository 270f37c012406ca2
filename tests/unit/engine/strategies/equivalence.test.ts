import { describe, expect, it } from "vitest";
import { buildCandidateTables } from "@/lib/engine/strategies/dp/tables";
import { chargeSustainingFactor, factorRange, sweepEquivalenceFactor } from "@/lib/engine/strategies/equivalence";
import { example, parsed } from "../helpers";
import { tinyPlant } from "./tiny";

// ECMS theory (common practice, no source): a larger equivalence factor makes battery energy
// dearer, so the strategy charges more and burns more fuel; the charge-sustaining factor is
// where the final SOC crosses the initial one. With discrete candidates and a path-dependent
// run (limits, SOC pinned at a bound) monotonicity holds only up to small wiggles: we allow
// 1e-3 in ΔSOC (our tolerance, from the sweeps we looked at).
describe("equivalence-factor tools", () => {
  for (const pt of ["parallel", "series"] as const) {
    it(`${pt}: the sweep is monotone and the bisection lands where ΔSOC crosses zero`, () => {
      const plant = tinyPlant(parsed({ ...example(pt), cycle: { standard: "nedc" } }));
      const tables = buildCandidateTables(plant, 21);
      const sweep = sweepEquivalenceFactor(plant, tables, factorRange(2, 4, 9));
      for (let i = 1; i < sweep.length; i++) {
        expect(sweep[i].deltaSoc).toBeGreaterThanOrEqual(sweep[i - 1].deltaSoc - 1e-3);
      }
      // Fuel is not monotone step by step (the SOC touches its bounds during the cycle), but
      // ending charged costs more fuel than ending depleted.
      expect(sweep.at(-1)!.fuel_j).toBeGreaterThan(sweep[0].fuel_j);
      expect(sweep[0].deltaSoc).toBeLessThan(0);
      expect(sweep.at(-1)!.deltaSoc).toBeGreaterThan(0);
      const cs = chargeSustainingFactor(plant, tables, { toleranceSoc: 5e-4 });
      expect(cs.bracketed).toBe(true);
      expect(Math.abs(cs.deltaSoc)).toBeLessThanOrEqual(5e-4);
      const below = sweep.filter((p) => p.deltaSoc < -5e-4).at(-1)!;
      const above = sweep.find((p) => p.deltaSoc > 5e-4)!;
      expect(cs.factor).toBeGreaterThan(below.factor);
      expect(cs.factor).toBeLessThan(above.factor);
    });
  }
});
