import { describe, expect, it } from "vitest";
import { evaluateScenarioInput } from "@/lib/engine";
import { compile } from "@/lib/notebook/compile";
import { readDoc } from "@/lib/notebook/model";
import { createScenarioDoc } from "@/lib/notebook/templates";
import { POWERTRAINS } from "@/lib/notebook/blocks";

// The starting documents must be runnable: every step feasible on the NEDC, finite figures.
describe("templates run on the engine", () => {
  for (const pt of POWERTRAINS) {
    it(pt, () => {
      const { scenario } = compile(readDoc(createScenarioDoc(pt, pt)));
      const out = evaluateScenarioInput(scenario);
      if (!out.ok) throw new Error(JSON.stringify(out.errors));
      const kpi = out.result.kpi;
      expect(kpi.feasible).toBe(true);
      expect(kpi.infeasible_steps).toBe(0);
      // NEDC distance from its published definition: 11.007 km (UNECE R83 Annex 4a); rebuilt ≈ 11.013 km
      expect(kpi.distance_km).toBeCloseTo(11.0, 1);
      for (const v of Object.values(kpi)) if (typeof v === "number") expect(Number.isFinite(v)).toBe(true);
    });
  }
});
