import { describe, expect, it } from "vitest";
import { infeasibleFindings } from "@/lib/engine/findings";
import { computeDemand } from "@/lib/engine/demand";
import { buildCustomCycle } from "@/lib/engine/cycles";
import { V_SOC_LOW } from "@/lib/engine/step-output";
import { example, parsed } from "./helpers";

/**
 * DESIGN §4: an infeasible step is reported with time, component and by how much. A
 * message that prints demanded and available as the same figure ("0.400 demanded, 0.400
 * available") does not say by how much; the printed figures must differ when the values do.
 */
describe("review: findings print demanded and available distinguishably", () => {
  const s = parsed(example("bev"));
  const d = computeDemand(buildCustomCycle(1, [0, 10, 20, 10, 0]), s.vehicle, s.driveline);

  it("SOC 0.39996 against soc_min 0.4", () => {
    const [f] = infeasibleFindings(
      [{ violation: V_SOC_LOW, firstStep: 1, lastStep: 2, steps: 2, worstStep: 2, demanded: 0.39996, available: 0.4 }], d,
    );
    const m = /([-\d.e+]+) demanded, ([-\d.e+]+) available/.exec(f.message);
    expect(m).not.toBeNull();
    expect(m![1]).not.toBe(m![2]);
    expect(Number(m![1])).toBeCloseTo(0.39996, 8);
    expect(f.worst).toMatchObject({ demanded: 0.39996, available: 0.4 });
  });

  it("a large excess keeps the short form", () => {
    const [f] = infeasibleFindings(
      [{ violation: V_SOC_LOW, firstStep: 0, lastStep: 0, steps: 1, worstStep: 0, demanded: 0.2, available: 0.4 }], d,
    );
    expect(f.message).toMatch(/0\.200 demanded, 0\.400 available/);
  });
});
