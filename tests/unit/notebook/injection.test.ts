import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { evaluateValue, type ValueSpec } from "@/lib/notebook/expressions";
import { evaluateFormula } from "@/lib/notebook/formula";
import { evaluateParameters } from "@/lib/notebook/parameters";
import { FORMULA_MAX_LENGTH, safeParser } from "@/lib/notebook/safe-parser";

/**
 * Formulas are typed by any editor and evaluated in every collaborator's browser and on the
 * server: anything but arithmetic over numbers must be refused with a message, and nothing may
 * leak into prototypes, globals or the shared parser.
 */
const ratio: ValueSpec = { quantity: "ratio", unit: "" };
const env = evaluateParameters([{ name: "x", text: "2" }, { name: "a", text: "3" }]).env;

function snapshot() {
  return {
    objectProto: Object.getOwnPropertyNames(Object.prototype).sort().join(","),
    functionProto: Object.getOwnPropertyNames(Function.prototype).sort().join(","),
    arrayProto: Object.getOwnPropertyNames(Array.prototype).sort().join(","),
    globals: Object.getOwnPropertyNames(globalThis).sort().join(","),
    parserFunctions: Object.keys(safeParser().functions).sort().join(","),
    parserUnary: Object.keys(safeParser().unaryOps).sort().join(","),
  };
}

let before: ReturnType<typeof snapshot>;
beforeAll(() => { before = snapshot(); });
afterAll(() => {
  // no side effect of any attempt below
  expect(snapshot()).toEqual(before);
  expect(({} as Record<string, unknown>).polluted).toBeUndefined();
});

const ATTEMPTS: [string, RegExp][] = [
  ["constructor", /"constructor" is not allowed/],
  ["__proto__", /"__proto__" is not allowed/],
  ["prototype", /"prototype" is not allowed/],
  ["this", /"this" is not allowed/],
  ["x.constructor", /member access|not allowed/],
  ["x . constructor", /member access|not allowed/],
  ['[].constructor.constructor("return process")()', /not allowed/],
  ["a = 1", /assignments and definitions/],
  ["f(x) = x", /assignments and definitions/],
  ["x == 2", /assignments and definitions/],
  ["'abc'", /quotes/],
  ['"1"', /quotes/],
  ["x[0]", /brackets|unknown unit "0"/],
  ["{a: 1}", /brackets|braces/],
  ["1; process.exit()", /not allowed|only one expression/],
  ["process", /"process" is not allowed/],
  ["eval(1)", /"eval" is not allowed/],
  ["Function(1)", /"Function" is not allowed/],
  ["random()", /unknown name "random"/],
  ["fac(3)", /unknown name "fac"/],
  ["length(x)", /unknown name "length"/],
  ["map(x, x)", /unknown name "map"/],
  ["if(1, 2, 3)", /unknown name "if"/],
  ["x ? 1 : 2", /character not allowed/],
  ["3!", /character not allowed/],
  ["5 % 2", /unknown unit "% 2"/],
  ["x || 1", /character not allowed|not allowed/],
  ["not x", /unexpected|unknown name|not allowed/],
  ["toString", /"toString" is not allowed/],
  ["valueOf()", /"valueOf" is not allowed/],
  ["hasOwnProperty", /unknown name "hasOwnProperty"/],
  ["sqrt", /unknown name "sqrt"|must be called/],
  ["min", /must be called/],
  ["1.constructor", /unknown unit "constructor"/],
  ["(1).constructor", /member access/],
  ["x\n.constructor", /member access/],
  ['x["constructor"]', /unknown unit/],
  ["2.toString()", /unexpected text/],
  ["x?.y", /member access/],
  ["0x10", /unknown unit "x10"/],
];

describe("injection attempts are refused with a message", () => {
  for (const [text, message] of ATTEMPTS) {
    it(JSON.stringify(text), () => {
      const r = evaluateValue(text, ratio, env);
      expect(r.ok, `${text} was accepted`).toBe(false);
      if (!r.ok) expect(r.message).toMatch(message);
    });
  }

  it("very long input is refused before parsing", () => {
    const text = "1+".repeat(FORMULA_MAX_LENGTH) + "1";
    const r = evaluateFormula(text, env.scope);
    expect(r).toMatchObject({ ok: false, message: expect.stringContaining("too long") });
  });

  it("deep nesting is refused", () => {
    const text = "(".repeat(200) + "1" + ")".repeat(200);
    const r = evaluateFormula(text, env.scope);
    expect(r).toMatchObject({ ok: false, message: expect.stringContaining("nested too deeply") });
  });

  it("nesting within the limit still works", () => {
    const text = "(".repeat(30) + "1" + ")".repeat(30);
    expect(evaluateFormula(text, env.scope)).toMatchObject({ ok: true, value_si: 1 });
  });

  it.each([
    ["Infinity", /unknown name "Infinity"/],
    ["NaN", /unknown name "NaN"/],
    ["1/0", /infinite/],
    ["-1/0", /infinite/],
    ["0/0", /gives no number/],
    ["sqrt(-1)", /gives no number/],
    ["ln(0)", /infinite/],
    ["10^400", /infinite/],
    ["1e400", /infinite/],
  ])("non-finite results: %s", (text, message) => {
    const r = evaluateValue(text, ratio, env);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(message);
  });

  it("a scope value that is not a finite number never reaches the parser", () => {
    const scope = new Map([["y", { value_si: Number.NaN, dim: [0, 0, 0, 0] as const }]]);
    expect(evaluateFormula("y + 1", scope)).toMatchObject({ ok: false, message: 'unknown name "y"' });
  });

  it("parameter names cannot shadow functions, constants or prototype keys", () => {
    const set = evaluateParameters([
      { name: "constructor", text: "1" }, { name: "__proto__", text: "1" }, { name: "sqrt", text: "1" },
      { name: "PI", text: "3" }, { name: "1abc", text: "1" }, { name: "_0", text: "1" },
    ]);
    for (const name of ["constructor", "__proto__", "sqrt", "PI", "1abc", "_0"]) {
      expect(set.results.get(name)?.ok, name).toBe(false);
    }
    expect(set.env.scope.size).toBe(0);
  });

  it("the parser still evaluates ordinary formulas after all attempts", () => {
    expect(evaluateValue("x * a + 1", ratio, env)).toMatchObject({ ok: true, value: 7 });
  });
});
