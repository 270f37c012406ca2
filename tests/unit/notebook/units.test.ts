import { describe, expect, it } from "vitest";
import { unit as mathUnit } from "mathjs";
import { QUANTITIES } from "@/lib/notebook/dimensions";
import { findUnit, parseMeasured, unitKey } from "@/lib/notebook/units";
import { UNITS } from "@/lib/notebook/unit-table";

// Oracle: mathjs 15 unit() (independent unit library, devDependency). Our symbol → mathjs spelling.
const ORACLE: Record<string, string> = {
  "%": "",
  m: "m", mm: "mm", cm: "cm", km: "km", "m²": "m^2", "cm²": "cm^2", L: "L", "cm³": "cc", "m³": "m^3",
  kg: "kg", g: "g", t: "tonne", s: "s", min: "min", h: "h",
  "m/s": "m/s", "km/h": "km/h", mph: "mi/h", "m/s²": "m/s^2", "rad/s": "rad/s", rpm: "cycle/min",
  N: "N", kN: "kN", "N·m": "N m", "kN·m": "kN m", J: "J", kJ: "kJ", MJ: "MJ", Wh: "Wh", kWh: "kWh",
  W: "W", kW: "kW", MW: "MW", hp: "hp", Pa: "Pa", kPa: "kPa", MPa: "MPa", bar: "bar",
  "kg/m³": "kg/m^3", "kg/L": "kg/L", "g/L": "g/L", "MJ/kg": "MJ/kg", "kJ/kg": "kJ/kg", "kWh/kg": "kWh/kg",
  "g/kWh": "g/kWh", A: "A", Ah: "Ah", mAh: "mAh", V: "V", "Ω": "ohm", "mΩ": "mohm",
};

// mathjs dimension order: mass, length, time, current, temperature, luminous intensity, amount, angle, bit
function mathDims(text: string): number[] {
  const d = (mathUnit(text) as unknown as { dimensions: number[] }).dimensions;
  return [d[1], d[0], d[2], d[3]]; // → ours: m, kg, s, A (angle is dimensionless here, as in SI)
}

describe("unit table against mathjs", () => {
  const withOracle = UNITS.filter((u) => ORACLE[u.symbol] !== undefined && ORACLE[u.symbol] !== "");
  it("covers most of the table", () => {
    expect(withOracle.length).toBeGreaterThanOrEqual(50);
  });
  for (const u of withOracle) {
    it(`${u.symbol}: factor to SI and dimension agree with mathjs "${ORACLE[u.symbol]}"`, () => {
      const value = 37.5; // arbitrary non-round value
      const expected = mathUnit(`${value} ${ORACLE[u.symbol]}`).toSI().toNumber();
      const r = parseMeasured(`${value} ${u.symbol}`, findUnit("")!);
      expect(r.ok).toBe(true);
      if (!r.ok) return;
      expect(r.measured.unit.symbol).toBe(u.symbol);
      // relative 1e-9: mathjs stores some factors (hp) to 10 significant digits
      expect(Math.abs(r.measured.value_si - expected)).toBeLessThanOrEqual(1e-9 * Math.abs(expected));
      expect(mathDims(`1 ${ORACLE[u.symbol]}`)).toEqual([...QUANTITIES[u.quantity].dim]);
    });
  }
});

describe("units outside mathjs", () => {
  it("percent is one hundredth", () => {
    const r = parseMeasured("5 %", findUnit("")!);
    expect(r.ok && r.measured.value_si).toBe(0.05);
  });
  it("metric horsepower PS = 735.49875 W (NIST SP 811, B.8)", () => {
    const r = parseMeasured("100 PS", findUnit("")!);
    expect(r.ok && r.measured.value_si).toBeCloseTo(73549.875, 6);
  });
  it("rpm = 2π/60 rad/s (definition)", () => {
    const r = parseMeasured("3000 rpm", findUnit("")!);
    expect(r.ok && r.measured.value_si).toBeCloseTo(100 * Math.PI, 10);
  });
});

describe("spellings", () => {
  it.each([
    ["10 N m", "N·m"], ["10 N*m", "N·m"], ["10 Nm", "N·m"], ["10 N⋅m", "N·m"], ["10 N·m", "N·m"],
    ["2.2 m^2", "m²"], ["2.2 m2", "m²"], ["1.2 kg/m^3", "kg/m³"], ["9.81 m/s^2", "m/s²"],
    ["0.1 ohm", "Ω"], ["0.1 Ω", "Ω"], ["0.1 Ω", "Ω"], ["80 mohm", "mΩ"], ["90 km / h", "km/h"], ["1.6 l", "L"],
  ])("%s → %s", (text, symbol) => {
    const r = parseMeasured(text, findUnit("")!);
    expect(r.ok && r.measured.unit.symbol).toBe(symbol);
  });
  it("keeps case: mW is not MW", () => {
    expect(findUnit("MW")?.symbol).toBe("MW");
    expect(findUnit("mW")).toBeUndefined();
  });
  it("suggests the right case for an unknown unit", () => {
    const r = parseMeasured("50 KW", findUnit("")!);
    expect(r.ok).toBe(false);
    if (!r.ok && "message" in r) {
      expect(r.message).toContain('unknown unit "KW"');
      expect(r.message).toContain("did you mean kW");
      expect(r.at).toBe(3);
    }
  });
  it("a number followed by an operator is not a literal (it is a formula)", () => {
    expect(parseMeasured("2 * x", findUnit("")!)).toEqual({ ok: false, notLiteral: true });
    expect(parseMeasured("x", findUnit("")!)).toEqual({ ok: false, notLiteral: true });
  });
  it("unitKey normalises separators and exponents", () => {
    expect(unitKey(" N  m ")).toBe("N·m");
    expect(unitKey("m²")).toBe(unitKey("m^2"));
  });
  it("every spelling maps to exactly one unit", () => {
    const seen = new Map<string, string>();
    for (const u of UNITS) {
      for (const s of [u.symbol, ...(u.aliases ?? [])]) {
        const k = unitKey(s);
        expect(seen.get(k) ?? u.symbol, `spelling "${s}"`).toBe(u.symbol);
        seen.set(k, u.symbol);
      }
    }
  });
});
