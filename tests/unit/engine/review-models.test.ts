import { describe, expect, it } from "vitest";
import { FullLoadCurve } from "@/lib/engine/models/full-load-curve";
import { OperatingLine } from "@/lib/engine/models/operating-line";
import { buildCustomCycle } from "@/lib/engine/cycles";
import { computeDemand } from "@/lib/engine/demand";
import { rpmToRadS } from "@/lib/engine/units";
import { example, parsed } from "./helpers";

/** The neighbouring double of x, `steps` units in the last place away (+ up, − down). */
function ulpStep(x: number, steps: number): number {
  const f = new Float64Array([x]);
  const i = new BigInt64Array(f.buffer);
  i[0] += BigInt(steps);
  return f[0];
}

describe("review: speed-scheduled gear at a threshold", () => {
  // DESIGN §3: gear = 1 + count(mean speed >= threshold). Closed-form: the mean of two
  // samples of 61 km/h is 61 km/h, so a 61 km/h threshold selects the upper gear; the mean
  // of 29 and 31 km/h is 30 km/h. The km/h → m/s → km/h round trip must not decide the gear.
  const s = parsed(example("conventional"));
  const driveline = (th: number) => ({ ...s.driveline, gear_ratios: [3, 2], upshift_speeds_kmh: [th] });

  it("a steady 61 km/h with the upshift at 61 km/h runs in gear 2", () => {
    const d = computeDemand(buildCustomCycle(1, [61, 61, 61]), s.vehicle, driveline(61));
    expect(Array.from(d.gear)).toEqual([2, 2]);
  });

  it("a 29 → 31 km/h step (mean 30 km/h) with the upshift at 30 km/h runs in gear 2", () => {
    const d = computeDemand(buildCustomCycle(1, [29, 31]), s.vehicle, driveline(30));
    expect(d.gear[0]).toBe(2);
  });

  it("just below the threshold stays in gear 1", () => {
    const d = computeDemand(buildCustomCycle(1, [60.999, 60.999]), s.vehicle, driveline(61));
    expect(d.gear[0]).toBe(1);
  });
});

describe("review: series operating line at the ends of its segments", () => {
  // DESIGN §4: the lowest speed, not below idle, whose full-load power delivers the request,
  // solved exactly on the piecewise-linear curve. Closed-form on these curves: full-load
  // power T·ω at a breakpoint is T_i·ω_i, and a request a rounding unit away from it must be
  // met at (practically) that breakpoint speed — never refused, never far above it.
  it("a request one unit below the peak power gets a speed (peak at the top breakpoint)", () => {
    const curve = new FullLoadCurve([800, 1000, 1500], [80, 80, 200]);
    const line = new OperatingLine(curve, rpmToRadS(800), rpmToRadS(1500));
    const peak = 200 * rpmToRadS(1500); // 31,415.93 W at 1500 rpm
    expect(line.maxPower_w).toBeCloseTo(peak, 6);
    const w = line.speedFor_rad_s(ulpStep(line.maxPower_w, -1));
    expect(w).toBeGreaterThanOrEqual(rpmToRadS(800));
    expect(Math.abs(w - rpmToRadS(1500))).toBeLessThan(1e-6);
  });

  it("a request one unit above a breakpoint's power is met at that breakpoint, not further up", () => {
    // 150 N·m flat to 1000 rpm, then falling to 50 N·m at 2500 rpm: P(1000 rpm) = 15,707.96 W;
    // the falling segment reaches the same power again only at 2250 rpm.
    const curve = new FullLoadCurve([800, 1000, 2500], [150, 150, 50]);
    const line = new OperatingLine(curve, rpmToRadS(800), rpmToRadS(2500));
    const atBreak = 150 * rpmToRadS(1000);
    for (const steps of [-2, -1, 0, 1, 2]) {
      const w = line.speedFor_rad_s(ulpStep(atBreak, steps));
      expect(Math.abs(w - rpmToRadS(1000))).toBeLessThan(1e-6);
    }
  });
});
