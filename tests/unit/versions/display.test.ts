import { describe, expect, it } from "vitest";
import { sameAsText, signed } from "@/components/versions/diff/delta";
import { formatNumber, showValue } from "@/lib/versions";

describe("diff display helpers", () => {
  it("an evaluated value that only repeats the text is not shown twice", () => {
    expect(sameAsText("0.30", "0.3")).toBe(true);
    expect(sameAsText("3.6, 2.1, 1.0", "3.6, 2.1, 1")).toBe(true);
    expect(sameAsText("2100 kg", "2100 kg")).toBe(true);
    expect(sameAsText("curb_mass + payload", "1500 kg")).toBe(false);
    expect(sameAsText("5 %", "0.05")).toBe(false);
    expect(sameAsText("", "0")).toBe(false);
  });

  it("signed deltas carry a plus sign and a real minus sign", () => {
    expect(signed(600, 0)).toBe("+600");
    expect(signed(-0.25, 2)).toBe("−0.25");
    expect(signed(null, 2)).toBe("—");
  });

  it("values keep six significant digits and switch to exponents only for extreme sizes", () => {
    expect(formatNumber(1500)).toBe("1500");
    expect(formatNumber(0.1 + 0.2)).toBe("0.3");
    expect(formatNumber(-2.5e-6)).toBe("−2.5000e-6");
    expect(showValue([3.6, 2.1], "").text).toBe("3.6, 2.1");
    expect(showValue(1.2, "kg/m³").text).toBe("1.2 kg/m³");
  });
});
