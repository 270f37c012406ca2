import { describe, expect, it } from "vitest";
import { evaluateParameters } from "@/lib/notebook/parameters";
import { evaluateValue } from "@/lib/notebook/expressions";

const msg = (set: ReturnType<typeof evaluateParameters>, name: string) => {
  const r = set.results.get(name);
  return r && !r.ok ? r.message : undefined;
};

describe("parameters", () => {
  it("evaluates in dependency order, whatever the written order", () => {
    const set = evaluateParameters([
      { name: "total", text: "curb + payload" },
      { name: "payload", text: "driver * 2" },
      { name: "curb", text: "1.4 t" },
      { name: "driver", text: "75 kg" },
    ]);
    expect(set.env.scope.get("total")?.value_si).toBe(1550);
  });

  it("a literal keeps its unit's dimension; a bare number is a pure number", () => {
    const set = evaluateParameters([{ name: "p", text: "50 kW" }, { name: "k", text: "0.8" }]);
    expect(set.env.scope.get("p")).toEqual({ value_si: 50_000, dim: [2, 1, -3, 0], si: true });
    expect(set.env.scope.get("k")).toEqual({ value_si: 0.8, dim: [0, 0, 0, 0], si: false });
  });

  it("formula parameters get a unit to be shown in", () => {
    const set = evaluateParameters([
      { name: "m", text: "1.4 t" }, { name: "m2", text: "2 * m" }, { name: "f", text: "m * 9.81 m/s²" }, { name: "k", text: "2 * 3" },
    ]);
    expect(set.results.get("m2")).toMatchObject({ ok: true, unit: "t", value_si: 2800 });
    expect(set.results.get("f")).toMatchObject({ ok: true, unit: "N" });
    expect(set.results.get("k")).toMatchObject({ ok: true, unit: undefined });
  });

  it("names a two-step cycle on both members", () => {
    const set = evaluateParameters([{ name: "a", text: "b + 1" }, { name: "b", text: "a * 2" }]);
    expect(msg(set, "a")).toBe("cycle: a → b → a");
    expect(msg(set, "b")).toBe("cycle: a → b → a");
  });

  it("names a longer cycle and a self-reference", () => {
    const set = evaluateParameters([
      { name: "a", text: "b" }, { name: "b", text: "c" }, { name: "c", text: "a" }, { name: "s", text: "s + 1" },
    ]);
    expect(msg(set, "c")).toBe("cycle: a → b → c → a");
    expect(msg(set, "s")).toBe("cycle: s → s");
  });

  it("a parameter that uses a failed one fails, naming it; others are unaffected", () => {
    const set = evaluateParameters([
      { name: "a", text: "b" }, { name: "b", text: "a" }, { name: "c", text: "a + 1" }, { name: "d", text: "4" },
    ]);
    expect(msg(set, "c")).toBe('uses "a", which has an error');
    expect(set.env.scope.get("d")?.value_si).toBe(4);
    expect(set.env.broken.has("c")).toBe(true);
  });

  it("unknown names are errors naming the name", () => {
    const set = evaluateParameters([{ name: "m", text: "2 * mass_typo" }]);
    expect(msg(set, "m")).toBe('unknown name "mass_typo"');
  });

  it("a name defined twice is an error", () => {
    const set = evaluateParameters([{ name: "m", text: "1" }, { name: "m", text: "2" }]);
    expect(msg(set, "m")).toBe('"m" is defined twice');
  });

  it("a unit literal in a formula is not a reference (no false cycle for a parameter named like a unit)", () => {
    const set = evaluateParameters([{ name: "kg", text: "3" }, { name: "m", text: "100 kg * kg" }]);
    expect(set.env.scope.get("m")?.value_si).toBe(300);
  });

  it("fields see the failure of a parameter they use", () => {
    const set = evaluateParameters([{ name: "a", text: "a" }]);
    const r = evaluateValue("a * 2", { quantity: "ratio", unit: "" }, set.env);
    expect(r).toMatchObject({ ok: false, message: 'parameter "a" has an error: cycle: a → a' });
  });
});
