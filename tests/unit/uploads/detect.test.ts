import { describe, expect, it } from "vitest";
import { previewCycle } from "@/lib/uploads";
import { splitHeader } from "@/lib/uploads/units";

const propose = (text: string) => {
  const r = previewCycle({ text });
  if (!r.proposal) throw new Error("no proposal");
  return r;
};

describe("header and unit detection", () => {
  it.each([
    ["speed [km/h]", { name: "speed", unit: "km/h" }],
    ["v_mph", { name: "v", unit: "mph" }],
    ["Speed (m/s)", { name: "Speed", unit: "m/s" }],
    ["time_s", { name: "time", unit: "s" }],
    ["t [min]", { name: "t", unit: "min" }],
    ["grade %", { name: "grade", unit: "%" }],
    ["speed in mph", { name: "speed", unit: "mph" }],
    ["Vehicle speed", { name: "Vehicle speed", unit: null }],
  ])("splits %s", (header, expected) => {
    expect(splitHeader(header)).toEqual(expected);
  });

  it.each([
    ["time [s],speed [km/h]\n0,0\n1,1\n", ",", { column: 1, unit: "s" }, { column: 2, unit: "km/h" }],
    ["t;v_mph\n0;0\n1;1\n", ";", { column: 1, unit: "s" }, { column: 2, unit: "mph" }],
    ["Speed (m/s)\tTime [min]\n0\t0\n1\t0.5\n", "\t", { column: 2, unit: "min" }, { column: 1, unit: "m/s" }],
    ["elapsed|kph\n0|0\n1|1\n", "|", { column: 1, unit: "s" }, { column: 2, unit: "km/h" }],
  ])("proposes columns and units for %j", (text, delimiter, time, speed) => {
    const r = propose(text);
    expect(r.proposal?.layout.delimiter).toBe(delimiter);
    expect(r.proposal?.time).toEqual(time);
    expect(r.proposal?.speed).toEqual(speed);
  });

  it("reads a names row and a units row as one header", () => {
    const r = propose("Time,Speed,Grade\ns,mph,%\n0,0,0\n1,1,1\n");
    expect(r.proposal?.layout.header_rows).toBe(2);
    expect(r.proposal?.layout.headers).toEqual(["Time [s]", "Speed [mph]", "Grade [%]"]);
    expect(r.proposal?.speed).toEqual({ column: 2, unit: "mph" });
    expect(r.proposal?.grade).toEqual({ column: 3 });
  });

  it("says what it assumed when the header gives no unit", () => {
    const r = propose("time,speed\n0,0\n1,1\n");
    expect(r.proposal?.notes).toEqual(['time unit not given in "time"; assumed seconds', 'speed unit not given in "speed"; assumed km/h']);
  });

  it("reads a decimal comma with a semicolon delimiter", () => {
    const r = propose("zeit [s];geschwindigkeit [km/h]\n0;0\n1;2,5\n2;5\n");
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.cycle.speed_kmh).toEqual([0, 2.5, 5]);
  });

  it("converts units exactly: mph by 1.609344 km/mi (international mile), m/s by 3.6, minutes by 60", () => {
    const mph = propose("time [s],speed [mph]\n0,0\n1,10\n");
    if (mph.ok) expect(mph.cycle.speed_kmh).toEqual([0, 16.09344]);
    const ms = propose("time [min],speed [m/s]\n0,0\n0.05,2\n0.1,4\n");
    expect(ms.ok).toBe(true);
    if (ms.ok) {
      expect(ms.cycle.dt_s).toBeCloseTo(3, 12);
      expect(ms.cycle.speed_kmh).toEqual([0, 7.2, 14.4]);
    }
  });

  it("without a header takes one column as speed at 1 Hz, two as time and speed", () => {
    const one = propose("0\n5\n10\n");
    expect(one.ok && one.cycle).toMatchObject({ dt_s: 1, speed_kmh: [0, 5, 10] });
    const two = propose("0,0\n0.5,1\n1,2\n");
    expect(two.ok && two.cycle).toMatchObject({ dt_s: 0.5, speed_kmh: [0, 1, 2] });
  });

  it("accepts a UTF-8 byte-order mark", () => {
    const bytes = new Uint8Array([0xef, 0xbb, 0xbf, ...new TextEncoder().encode("time [s],speed [km/h]\n0,0\n1,1\n")]);
    const r = previewCycle({ bytes });
    expect(r.ok).toBe(true);
    expect(r.proposal?.layout.headers[0]).toBe("time [s]");
  });

  it("the user's confirmation overrides the guess (speed unit m/s instead of km/h)", () => {
    const text = "time,speed\n0,0\n1,1\n";
    const guessed = previewCycle({ text });
    const confirmed = previewCycle({ text }, { ...guessed.confirmation!, speed: { column: 2, unit: "m/s" } });
    expect(confirmed.ok && confirmed.cycle.speed_kmh).toEqual([0, 3.6]);
  });
});
