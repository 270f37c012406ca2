import { describe, expect, it } from "vitest";
import { compareStrategies } from "@/lib/engine/strategies/compare";
import { example, parsed } from "../helpers";

// Serrao, Onori & Rizzoni, ASME JDSMC 133(3), 2011 (REFERENCES.md): DP is the lower bound that
// ECMS and rule-based strategies approach from above on the same model and cycle. Compared on
// SOC-corrected fuel (soc-correction.ts), ECMS with its charge-sustaining factor (bisection).
// DESIGN §4: DP is the lower bound "up to grid error". Our grid-refinement study
// (docs/strategies.md) with 201 SOC points: about 0.2 % on NEDC, but up to ~2 % on a single
// ECE-15 (24 g of fuel; the series DP goes 24.44 → 24.27 → 23.88 g from 51 → 201 → 3201
// points while ECMS, near-optimal on this affine-engine model, gets 23.81 g). So DP may exceed
// ECMS by at most 0.5 % on EUDC / NEDC and 2 % on ECE-15 (our tolerances, from that study).
// ECMS ≤ rule/thermostat is asserted with 0.1 % slack.
const CASES = [
  ["parallel", "ece15", 0.02], ["parallel", "eudc", 0.005], ["parallel", "nedc", 0.005],
  ["series", "ece15", 0.02], ["series", "eudc", 0.005], ["series", "nedc", 0.005],
] as const;

describe("DP ≤ ECMS ≤ rule / thermostat on SOC-corrected fuel", () => {
  for (const [pt, cycle, gridTol] of CASES) {
    it(`${pt} on ${cycle}`, () => {
      const s = parsed({ ...example(pt), cycle: { standard: cycle } });
      const out = compareStrategies(s, { gridCheck: false });
      if (!out.ok) throw new Error(out.reason);
      const [base, ecms, dp] = out.comparison.strategies;
      expect([base.kind, ecms.kind, dp.kind]).toEqual([pt === "series" ? "thermostat" : "rule", "ecms", "dp"]);
      for (const f of [base, ecms, dp]) expect(f.feasible).toBe(true);
      expect(dp.soc_final).toBeGreaterThanOrEqual(out.comparison.dp.soc_final_min - 1e-12);
      expect(dp.soc_final).toBeLessThanOrEqual(out.comparison.dp.soc_final_max + 1e-12);
      expect(dp.fuel_corrected_g).toBeLessThanOrEqual(ecms.fuel_corrected_g * (1 + gridTol));
      expect(ecms.fuel_corrected_g).toBeLessThanOrEqual(base.fuel_corrected_g * 1.001);
      expect(dp.gap_to_dp_pct).toBe(0);
      expect(out.comparison.findings.filter((f) => f.severity === "infeasible")).toEqual([]);
    });
  }
});
