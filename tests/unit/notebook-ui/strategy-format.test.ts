// The strategy table's signed percentages: a gap that rounds to zero reads "0.0", never "−0.0"
// (a negative zero suggests a strategy beat the DP optimum). Expected strings written by hand.
import { describe, expect, test } from "vitest";
import { signed, SOC_COLORS } from "@/components/strategy/rows";

describe("signed", () => {
  test("sign only for values that do not round to zero, with a true minus sign", () => {
    expect(signed(1.234)).toBe("+1.2");
    expect(signed(-0.44)).toBe("\u22120.4");
    expect(signed(-0.04)).toBe("0.0");
    expect(signed(-0)).toBe("0.0");
    expect(signed(0.049)).toBe("0.0");
    expect(signed(0.05 + 1e-9)).toBe("+0.1");
    expect(signed(1234.5, 0)).toBe("+1,235");
  });

  test("one colour per strategy of a comparison (rule or thermostat, ECMS, DP)", () => {
    expect(new Set(SOC_COLORS).size).toBe(3);
  });
});
