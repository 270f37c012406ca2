import { describe, expect, it } from "vitest";
import { evaluateValue, type ValueSpec } from "@/lib/notebook/expressions";
import { parseList } from "@/lib/notebook/lists";
import { evaluateParameters } from "@/lib/notebook/parameters";

/**
 * Random texts built from the characters people (and attackers) type: evaluation must never
 * throw, never return NaN or ±∞, and always give a message when it refuses.
 * Deterministic generator (mulberry32, common practice, no source) so a failure reproduces.
 */
function mulberry32(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const PIECES = [
  "1", "2.5", "0", "1e308", "-", "+", "*", "/", "^", "(", ")", ",", ".", " ", "x", "m", "kg", "km/h", "%", "[kW]", "[", "]",
  "sqrt(", "min(", "pow(", "PI", "E", "constructor", "__proto__", "=", "'", "\"", ";", "?", ":", "!", "$", "this", "N·m", "−", "×",
  "rpm", "a", "b", "1/0", "ln(", "\n", "\t", "🙂", "\u0000",
];

const env = evaluateParameters([{ name: "x", text: "3 kg" }, { name: "a", text: "2" }, { name: "b", text: "a * 4 [kW]" }]).env;
const specs: ValueSpec[] = [
  { quantity: "ratio", unit: "" }, { quantity: "mass", unit: "kg" }, { quantity: "power", unit: "kW" },
  { quantity: "count", unit: "", integer: true }, { quantity: "ratio", unit: "%" },
];

describe("fuzz: evaluation is total", () => {
  it("5000 random texts", () => {
    const rnd = mulberry32(20261201);
    let accepted = 0;
    for (let n = 0; n < 5000; n++) {
      const len = 1 + Math.floor(rnd() * 8);
      let text = "";
      for (let k = 0; k < len; k++) text += PIECES[Math.floor(rnd() * PIECES.length)];
      const spec = specs[n % specs.length];
      const r = evaluateValue(text, spec, env);
      if (r.ok) {
        accepted++;
        expect(Number.isFinite(r.value), text).toBe(true);
        expect(Number.isFinite(r.value_si), text).toBe(true);
      } else {
        expect(r.message.length, text).toBeGreaterThan(0);
        if (r.at !== undefined) expect(r.at >= 0 && r.at <= text.length, `${text} at ${r.at}`).toBe(true);
      }
      const p = evaluateParameters([{ name: "x", text: "2" }, { name: "q", text }]).results.get("q")!;
      if (p.ok) expect(Number.isFinite(p.value_si), text).toBe(true);
      else expect(p.message.length, text).toBeGreaterThan(0);
      const l = parseList(text, spec, env);
      if (l.ok) l.values.forEach((v) => expect(Number.isFinite(v), text).toBe(true));
    }
    // the generator is not all noise: some texts are valid
    expect(accepted).toBeGreaterThan(100);
  });
});
