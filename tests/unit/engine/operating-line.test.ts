import { describe, expect, it } from "vitest";
import { FullLoadCurve } from "@/lib/engine/models/full-load-curve";
import { OperatingLine } from "@/lib/engine/models/operating-line";
import { rpmToRadS } from "@/lib/engine/units";

/** Independent oracle: fine scan for the lowest speed whose full-load power reaches p. */
function bruteForce(curve: FullLoadCurve, idle: number, max: number, p: number, steps = 400_000): number {
  for (let i = 0; i <= steps; i++) {
    const w = idle + ((max - idle) * i) / steps;
    if (curve.torqueAt(w) * w >= p) return w;
  }
  return -1;
}

const CURVES: [string, number[], number[], number, number][] = [
  ["rising then falling", [800, 1500, 2500, 4000, 5000, 6000], [95, 130, 150, 150, 140, 120], 800, 6000],
  ["steeply falling top (power peaks inside a segment)", [1000, 2000, 3000, 5000], [100, 160, 160, 20], 1200, 5000],
  ["curve starting below idle", [0, 1000, 3000, 4500], [50, 90, 120, 110], 900, 4500],
];

describe("series engine–generator operating line (exact per segment)", () => {
  for (const [label, rpm, nm, idleRpm, maxRpm] of CURVES) {
    it(`${label}: matches a 400,000-point scan to its resolution`, () => {
      const curve = new FullLoadCurve(rpm, nm);
      const idle = rpmToRadS(idleRpm), max = rpmToRadS(maxRpm);
      const line = new OperatingLine(curve, idle, max);
      const resolution = (max - idle) / 400_000;
      let scanMax = 0;
      for (let i = 0; i <= 20000; i++) {
        const w = idle + ((max - idle) * i) / 20000;
        scanMax = Math.max(scanMax, curve.torqueAt(w) * w);
      }
      expect(line.maxPower_w).toBeGreaterThanOrEqual(scanMax * (1 - 1e-12));
      for (let j = 1; j < 60; j++) {
        const p = (line.maxPower_w * j) / 60;
        const exact = line.speedFor_rad_s(p);
        const scan = bruteForce(curve, idle, max, p);
        expect(exact).toBeGreaterThanOrEqual(idle);
        expect(Math.abs(exact - scan)).toBeLessThanOrEqual(resolution * 1.0001);
        // on the line the full-load power equals the request (unless idle already suffices)
        if (exact > idle) expect(Math.abs(curve.torqueAt(exact) * exact - p) / p).toBeLessThan(1e-9);
      }
      expect(line.speedFor_rad_s(line.maxPower_w * 1.001)).toBe(-1);
      // the peak itself is reached exactly, at the lowest speed where it occurs
      expect(line.speedFor_rad_s(line.maxPower_w)).toBeCloseTo(line.maxPowerSpeed_rad_s, 6);
    });
  }
});
