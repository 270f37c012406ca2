import { describe, expect, it } from "vitest";
import { unit as mathUnit } from "mathjs";
import { evaluateValue, EMPTY_ENV, type ValueSpec } from "@/lib/notebook/expressions";
import { evaluateParameters } from "@/lib/notebook/parameters";

const env = evaluateParameters([
  { name: "base_mass", text: "1500 kg" },
  { name: "payload", text: "base_mass * 0.1" },
  { name: "n", text: "3" },
  { name: "p", text: "n * 20 [kW]" },
  { name: "v", text: "90 km/h" },
]).env;

const mass: ValueSpec = { quantity: "mass", unit: "kg" };
const power: ValueSpec = { quantity: "power", unit: "kW" };
const ratio: ValueSpec = { quantity: "ratio", unit: "" };
const torque: ValueSpec = { quantity: "torque", unit: "N·m" };
const speed: ValueSpec = { quantity: "speed", unit: "km/h" };

function ok(text: string, spec: ValueSpec) {
  const r = evaluateValue(text, spec, env);
  if (!r.ok) throw new Error(`${text}: ${r.message}`);
  return r;
}
function bad(text: string, spec: ValueSpec) {
  const r = evaluateValue(text, spec, env);
  if (r.ok) throw new Error(`${text} should fail, got ${r.value}`);
  return r;
}

describe("literal values", () => {
  it("a bare number is in the field's unit", () => {
    expect(ok("1600", mass).value).toBe(1600);
    expect(ok("50", power).value_si).toBe(50_000);
  });
  it("a number with a unit is converted to the field's unit (oracle: mathjs)", () => {
    expect(ok("25 m/s", speed).value).toBeCloseTo(mathUnit("25 m/s").toNumber("km/h"), 12);
    // mathjs keeps hp to 10 significant digits
    expect(ok("100 hp", power).value).toBeCloseTo(mathUnit("100 hp").toNumber("kW"), 7);
    expect(ok("1.5 t", mass).value).toBe(1500);
  });
  it("keeps the written number when the unit is the field's (no round-off)", () => {
    expect(ok("90 km/h", speed).value).toBe(90);
  });
  it("percent in a ratio field", () => {
    expect(ok("5 %", ratio).value).toBe(0.05);
    expect(ok("95%", ratio).value).toBe(0.95);
  });
  it("a dimension mismatch names the expected unit and the one given", () => {
    const r = bad("15 kWh", { quantity: "charge", unit: "Ah" });
    expect(r.message).toBe("expected Ah (charge), got kWh (energy)");
  });
  it("energy is not torque, though both are N·m in SI", () => {
    expect(bad("15 kWh", torque).message).toContain("got kWh (energy)");
  });
  it("typographic minus and multiplication signs are understood", () => {
    expect(ok("\u22125 %", ratio).value).toBe(-0.05);
    expect(ok("2 \u00d7 base_mass", mass).value).toBe(3000);
  });
  it("a decimal comma is explained", () => {
    expect(bad("1,5 t", mass)).toMatchObject({ message: expect.stringContaining("decimals with a point"), at: 1 });
  });
  it("an empty text is an error", () => {
    expect(bad("  ", mass).message).toBe("is empty");
  });
  it("integers: whole numbers only", () => {
    expect(ok("41", { quantity: "count", unit: "", integer: true }).value).toBe(41);
    expect(bad("2.5", { quantity: "count", unit: "", integer: true }).message).toContain("whole number");
  });
});

describe("formulas", () => {
  it("names stand for their SI values; a dimensioned result is converted", () => {
    expect(ok("2 * base_mass", mass).value).toBe(3000);
    expect(ok("p * 0.5", power).value).toBeCloseTo(30, 12);
    expect(ok("v * 2", speed).value).toBeCloseTo(180, 10);
  });
  it("numbers may carry units inside a formula", () => {
    expect(ok("base_mass + payload + 75 kg", mass).value).toBe(1725);
    expect(ok("base_mass + 0.2 t", mass).value).toBeCloseTo(1700, 10);
  });
  it("a pure-number result is read in the field's unit, or in the bracket unit", () => {
    expect(ok("n * 20", power).value).toBe(60);
    expect(ok("n * 20 [W]", power).value).toBeCloseTo(0.06, 12);
    expect(ok("(1 + 2) * 10 [hp]", power).value_si).toBeCloseTo(30 * 745.69987158227022, 6);
  });
  it("a ratio that came from a unit stays a quantity: 2 % × 2 in a percent field is 4 %", () => {
    const grade: ValueSpec = { quantity: "ratio", unit: "%" };
    const set = evaluateParameters([{ name: "k", text: "2 %" }, { name: "j", text: "3" }]);
    expect(evaluateValue("2 % * 2", grade, set.env)).toMatchObject({ ok: true, value: 4 });
    expect(evaluateValue("k * 2", grade, set.env)).toMatchObject({ ok: true, value: 4 });
    expect(evaluateValue("k * 2", ratio, set.env)).toMatchObject({ ok: true, value: 0.04 });
    // a bare-number parameter is read in the field's unit
    expect(evaluateValue("j * 2", grade, set.env)).toMatchObject({ ok: true, value: 6 });
  });
  it("a bracket unit after a dimensioned result is a check", () => {
    expect(ok("base_mass [kg]", mass).value).toBe(1500);
    expect(bad("base_mass [kW]", power).message).toContain("gives mass, not kW");
  });
  it("derived quantities: torque from power and speed (T = P / ω)", () => {
    // 60 kW at 3000 rpm: T = 60000 / (3000·2π/60) = 190.985... N·m (closed form)
    expect(ok("p / (3000 rpm)", torque).value).toBeCloseTo(60000 / (100 * Math.PI), 9);
  });
  it("adding different dimensions is refused", () => {
    expect(bad("base_mass + 10", mass).message).toBe("cannot add mass and a pure number");
    expect(bad("base_mass + p", mass).message).toBe("cannot add mass and power");
  });
  it("a dimensioned formula must give the field's dimension", () => {
    expect(bad("p * 2", mass).message).toContain("the formula gives power");
  });
  it("functions: sqrt halves dimensions, trig needs pure numbers", () => {
    expect(ok("sqrt(4 m²) [m]", { quantity: "length", unit: "m" }).value).toBe(2);
    expect(ok("min(base_mass, 2 t)", mass).value).toBe(1500);
    expect(ok("max(0.2, cos(PI / 3))", ratio).value).toBeCloseTo(0.5, 12);
    expect(bad("sin(base_mass)", ratio).message).toContain("sin needs a pure number");
    expect(bad("min(base_mass, p)", mass).message).toContain("min needs arguments of one kind");
    expect(bad("pow(base_mass, n)", mass).message).toContain("fixed number");
    expect(ok("pow(v, 2) / v", speed).value).toBeCloseTo(90, 10);
  });
  it("parse errors carry the character position", () => {
    expect(bad("2 * (3 + ", ratio)).toMatchObject({ message: "the formula ends too early", at: 9 });
    expect(bad("(1 + 2", ratio)).toMatchObject({ message: "missing )", at: 6 });
    // expr-eval reports the position at or just after the unexpected token
    expect(bad("1 + 2 3", ratio).at).toBeGreaterThanOrEqual(6);
    expect(bad("1 + 2 3", ratio).at).toBeLessThanOrEqual(7);
    expect(bad("2 $ 3", ratio)).toMatchObject({ at: 2 });
  });
  it("positions point into the original text even after unit literals", () => {
    // "100 kg" becomes a 2-character name internally; the error is still at index 16
    const r = bad("base_mass + 100 kg +", mass);
    expect(r.at).toBe(20);
  });
  it("unknown names are named, with their position", () => {
    const r = bad("2 * wheel_mass", mass);
    expect(r.message).toBe('unknown name "wheel_mass"');
    expect(r.at).toBe(4);
  });
  it("a bare word after a number suggests a product", () => {
    expect(bad("2 base_mass", mass).message).toContain("2 * base_mass");
  });
  it("works without any parameters", () => {
    expect(evaluateValue("2 * 3 [kW]", power, EMPTY_ENV)).toMatchObject({ ok: true, value: 6 });
  });
});
