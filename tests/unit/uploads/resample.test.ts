import { describe, expect, it } from "vitest";
import { previewCycle } from "@/lib/uploads";
import { medianSpacing_s, resampleLinear } from "@/lib/uploads/resample";

describe("resampling to a uniform step", () => {
  it("keeps rows that already sit on the grid unchanged", () => {
    const r = previewCycle({ text: "time [s],speed [km/h]\n10,0\n11,3\n12,6\n" });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.cycle).toMatchObject({ dt_s: 1, speed_kmh: [0, 3, 6], source: { rows: 3, time_offset_s: 10, resampled: false } });
    expect(r.warnings).toEqual(["the file starts at 10 s; the cycle starts there as 0 s"]);
  });

  it("chooses the median spacing and interpolates linearly", () => {
    // rows at 0, 1, 2, 4 s: median spacing 1 s; 3 s lies halfway between 2 s (20) and 4 s (40)
    const r = previewCycle({ text: "time [s],speed [km/h]\n0,0\n1,10\n2,20\n4,40\n" });
    expect(r.ok && r.cycle.speed_kmh).toEqual([0, 10, 20, 30, 40]);
    expect(r.ok && r.warnings).toEqual(["resampled 4 rows to 5 samples every 1 s by linear interpolation"]);
  });

  it("uses the step the user gives and drops a tail shorter than one step", () => {
    const text = "time [s],speed [km/h]\n0,0\n1,10\n2,20\n3,30\n";
    const guess = previewCycle({ text });
    const r = previewCycle({ text }, { ...guess.confirmation!, dt_s: 2 });
    expect(r.ok && r.cycle).toMatchObject({ dt_s: 2, speed_kmh: [0, 20] });
    expect(r.ok && r.warnings).toContain("the last 1 s (shorter than one step) are left out");
  });

  it("median spacing of a jittery 10 Hz log rounds to 0.1 s", () => {
    expect(medianSpacing_s([0, 0.1001, 0.1999, 0.3002, 0.4])).toBe(0.1);
  });

  it("interpolation preserves a linear ramp exactly at any step (identity)", () => {
    const t = [0, 0.7, 1.9, 3.1, 5];
    const v = t.map((x) => 2 * x + 1);
    const out = resampleLinear(t, v, 0.5, 10);
    out.forEach((y, k) => expect(y).toBeCloseTo(2 * (k * 0.5) + 1, 12));
  });

  it("reports a long gap it bridged", () => {
    const r = previewCycle({ text: "time [s],speed [km/h]\n0,0\n1,1\n2,2\n30,2\n31,2\n" });
    expect(r.ok && r.warnings).toContain("line 5: a gap of 28 s after line 4 is bridged by a straight line");
  });
});
