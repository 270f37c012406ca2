import { describe, expect, it } from "vitest";
import { unit as mathUnit } from "mathjs";
import { parseList, splitList } from "@/lib/notebook/lists";
import { evaluateParameters } from "@/lib/notebook/parameters";

describe("list syntax", () => {
  it("plain numbers in the field's unit", () => {
    expect(parseList("3.6, 2.1, 1.4, 1.0, 0.8", { quantity: "ratio", unit: "" })).toEqual({
      ok: true, values: [3.6, 2.1, 1.4, 1.0, 0.8], values_si: [3.6, 2.1, 1.4, 1.0, 0.8],
    });
  });
  it("a unit after the last item applies to the items without one (oracle: mathjs)", () => {
    const r = parseList("15, 30, 50, 70 mph", { quantity: "speed", unit: "km/h" });
    expect(r.ok).toBe(true);
    if (r.ok) {
      [15, 30, 50, 70].forEach((v, i) => expect(r.values[i]).toBeCloseTo(mathUnit(`${v} mi/h`).toNumber("km/h"), 10));
    }
  });
  it("a unit in brackets at the end is the list's unit", () => {
    expect(parseList("1000, 2000 [rpm]", { quantity: "angular_speed", unit: "rpm" })).toMatchObject({ ok: true, values: [1000, 2000] });
  });
  it("items may carry their own units and be formulas", () => {
    const env = evaluateParameters([{ name: "idle", text: "800 rpm" }]).env;
    const r = parseList("idle, 2 * idle, 3000 rpm, min(idle * 5, 6000 rpm)", { quantity: "angular_speed", unit: "rpm" }, env);
    expect(r.ok && r.values.map((v) => Math.round(v * 1e9) / 1e9)).toEqual([800, 1600, 3000, 4000]);
  });
  it("percent items in a ratio list", () => {
    expect(parseList("0 %, 50 %, 100 %", { quantity: "ratio", unit: "" })).toMatchObject({ ok: true, values: [0, 0.5, 1] });
  });
  it("grade list in percent: bare numbers stay percent", () => {
    expect(parseList("0, 2.5, -1", { quantity: "ratio", unit: "%" })).toMatchObject({ ok: true, values: [0, 2.5, -1] });
  });
  it("new lines, tabs and semicolons also separate (pasted columns)", () => {
    expect(splitList("1\n2\t3;4").map((i) => i.text)).toEqual(["1", "2", "3", "4"]);
  });
  it("an empty list is empty", () => {
    expect(parseList("  ", { quantity: "speed", unit: "km/h" })).toEqual({ ok: true, values: [], values_si: [] });
  });
  it("a bad item is named with its number and position", () => {
    const r = parseList("1, 2, x, 4", { quantity: "ratio", unit: "" });
    expect(r).toMatchObject({ ok: false, message: 'item 3: unknown name "x"', at: 6, index: 2 });
  });
  it("a list unit of the wrong kind is refused", () => {
    const r = parseList("100, 200 kW", { quantity: "torque", unit: "N·m" });
    expect(r).toMatchObject({ ok: false, message: "expected N·m (torque), got kW (power)" });
  });
});
