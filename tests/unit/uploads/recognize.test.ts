import { describe, expect, it } from "vitest";
import { previewCycle, recognizeCycle } from "@/lib/uploads";

// Published WLTC class 3b figures, UN GTR No. 15 Annex 1 (shared REFERENCES.md): phases by
// second Low 0–589, Medium 590–1022, High 1023–1477, Extra-high 1478–1800 (from memory for
// the boundaries; the durations 589/433/455/323 s are in REFERENCES.md), checksums
// 11140.3 / 17121.2 / 25782.2 / 29714.9 km/h.
const PHASES: [number, number, number][] = [[0, 589, 111403], [590, 1022, 171212], [1023, 1477, 257822], [1478, 1800, 297149]];

/**
 * A synthetic 1 Hz cycle in tenths of km/h with the published phase checksums: a
 * trapezoid per phase (30 s ramps), the remainder spread over the plateau a tenth at a time.
 * It is not the WLTC: it shows that recognition rests on exactly the published figures.
 */
function syntheticWltc(): number[] {
  const tenths: number[] = [];
  for (const [first, last, sum] of PHASES) {
    const n = last - first + 1;
    const level = Math.round(sum / (n - 32));
    const phase = Array.from({ length: n }, (_, i) => Math.round(level * Math.min(1, i / 30, (n - 1 - i) / 30)));
    let residual = sum - phase.reduce((a, b) => a + b, 0);
    for (let j = 0; residual !== 0; j++) {
      const step = Math.sign(residual);
      phase[31 + (j % (n - 62))] += step;
      residual -= step;
    }
    tenths.push(...phase);
  }
  return tenths.map((t) => t / 10);
}

// ECE-15 operations, UNECE R83 Annex 4a Table 1, transcribed here independently of lib/engine:
// [from km/h, to km/h, duration s].
const ECE: [number, number, number][] = [
  [0, 0, 11], [0, 15, 4], [15, 15, 8], [15, 10, 2], [10, 0, 3], [0, 0, 21], [0, 15, 5], [15, 15, 2], [15, 32, 5],
  [32, 32, 24], [32, 10, 8], [10, 0, 3], [0, 0, 21], [0, 15, 5], [15, 15, 2], [15, 35, 9], [35, 35, 2], [35, 50, 8],
  [50, 50, 12], [50, 35, 8], [35, 35, 13], [35, 32, 2], [32, 10, 7], [10, 0, 3], [0, 0, 7],
];
function ece1Hz(): number[] {
  const v = [0];
  for (const [a, b, d] of ECE) for (let i = 1; i <= d; i++) v.push(Math.round((a + ((b - a) * i) / d) * 10) / 10);
  return v;
}

const csv = (speeds: number[]) => "time [s],speed [km/h]\n" + speeds.map((v, t) => `${t},${v}`).join("\n") + "\n";

describe("published-cycle recognition", () => {
  it("labels an upload with all four WLTC 3b phase checksums, through the CSV path", () => {
    const speeds = syntheticWltc();
    expect(speeds.length).toBe(1801);
    const r = previewCycle({ text: csv(speeds) });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.recognition.label).toBe("matches WLTC class 3b (all four phase checksums)");
    expect(r.recognition.match).toBe("WLTC class 3b");
    // distance follows from the checksums for a rest-to-rest 1 Hz cycle: Σv / 3.6 = 83758.6 / 3.6 m = 23.266 km (published)
    expect(r.stats.distance_km).toBeCloseTo(23.266, 3);
  });

  it("names the phase whose checksum is missed", () => {
    const speeds = syntheticWltc();
    // take 71.2 km/h out of the Medium phase, 0.2 km/h from each of 356 plateau samples
    for (let t = 640; t < 640 + 356; t++) speeds[t] = Math.round((speeds[t] - 0.2) * 10) / 10;
    const r = recognizeCycle(1, speeds);
    expect(r.match).toBeNull();
    expect(r.label).toBe("has the duration of WLTC class 3b but not its figures: phase Medium speed sum 17050.0, published 17121.2");
  });

  it("labels ECE-15 built from the R83 table and rejects a copy that is off by more than 0.1 km/h", () => {
    const speeds = ece1Hz();
    expect(recognizeCycle(1, speeds).label).toBe("matches ECE-15 (UNECE R83) (every sample within 0.1 km/h of the rebuild)");
    speeds[60] += 1;
    expect(recognizeCycle(1, speeds).label).toBe("has the duration of ECE-15 (UNECE R83) but not its figures: largest difference from the R83 rebuild (km/h) 1.00, published 0.00");
  });

  it("checks a US cycle by distance and top speed", () => {
    // 1369 s at a steady 30 km/h: 11.408 km, far from UDDS 7.45 mi = 11.990 km, 56.7 mph = 91.2 km/h (40 CFR 86 App. I(a))
    const speeds = Array.from({ length: 1370 }, () => 30);
    expect(recognizeCycle(1, speeds).label).toBe(
      "has the duration of UDDS but not its figures: distance (km) 11.408, published 11.990; max speed (km/h) 30.0, published 91.2");
  });

  it("points at a missing first or last row when the length is one sample off", () => {
    // a common copy of the WLTC table runs 1..1800 s: 1800 samples instead of 1801
    expect(recognizeCycle(1, syntheticWltc().slice(1)).label).toBe("not a published cycle: 1800 samples; WLTC class 3b has 1801 (0 to 1800 s at 1 Hz), check the first and last rows");
  });

  it("says when no published cycle has the duration, and when the step is not 1 s", () => {
    expect(recognizeCycle(1, [0, 1, 2]).label).toMatch(/^not a published cycle: its 2 s duration matches none of WLTC class 3b 1800 s/);
    expect(recognizeCycle(0.5, [0, 1, 2]).label).toBe("published cycles are checked at 1 Hz; this cycle has a 0.5 s step");
  });
});
