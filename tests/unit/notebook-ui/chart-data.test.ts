// Result → chart rows, on real engine results of the notebook templates: the energy-flow columns
// balance exactly when the ledger closes (DESIGN §4), every row is finite, traces stay in budget.
import { describe, expect, test } from "vitest";
import { compile, createScenarioDoc, readDoc, POWERTRAINS } from "@/lib/notebook";
import { evaluateScenarioInput, type Result } from "@/lib/engine";
import { flowRows, ledgerRows, operatingPoints, thin, tracePanels, TRACE_BUDGET } from "@/lib/client/notebook/chart-data";
import { blockKindOfFinding } from "@/lib/client/notebook/findings";

function resultOf(powertrain: (typeof POWERTRAINS)[number]): Result {
  const compiled = compile(readDoc(createScenarioDoc(powertrain, "t")));
  if (!compiled.scenario) throw new Error(compiled.messages.map((m) => m.text).join("; "));
  const out = evaluateScenarioInput(compiled.scenario);
  if (!out.ok) throw new Error(out.errors.map((e) => e.message).join("; "));
  return out.result;
}

describe.each(POWERTRAINS)("chart rows for the %s template", (powertrain) => {
  const result = resultOf(powertrain);

  test("energy in equals energy out (the ledger closes), every value finite", () => {
    const rows = flowRows(result);
    const sum = (c: string) => rows.filter((r) => r.column === c).reduce((s, r) => s + r.kwh, 0);
    for (const r of rows) expect(Number.isFinite(r.kwh) && r.kwh >= 0).toBe(true);
    expect(Math.abs(sum("Energy in") - sum("Energy out"))).toBeLessThan(1e-6 * sum("Energy in") + 1e-9);
  });

  test("ledger shares sum to the input: supplies 100 %, sinks 100 % (up to the pack's sign)", () => {
    const rows = ledgerRows(result);
    for (const r of rows) expect(Number.isFinite(r.j)).toBe(true);
    const sinks = rows.filter((r) => r.side === "sink").reduce((s, r) => s + r.j, 0);
    const supplies = rows.filter((r) => r.side === "supply").reduce((s, r) => s + r.j, 0);
    expect(Math.abs(sinks - supplies)).toBeLessThan(1e-9 * Math.abs(supplies) + 1e-6);
  });

  test("trace panels are finite and within the point budget", () => {
    const panels = tracePanels(result);
    expect(panels[0]!.id).toBe("trace_speed");
    expect(panels.some((p) => p.id === "trace_soc")).toBe(powertrain !== "conventional");
    for (const p of panels) for (const r of p.rows) expect(Number.isFinite(r.t) && Number.isFinite(r.value)).toBe(true);
    expect(panels[0]!.rows.length).toBeLessThanOrEqual(TRACE_BUDGET);
  });

  test("each trace panel lists exactly the series it draws (the colour key under the panel)", () => {
    for (const p of tracePanels(result)) {
      expect(new Set(p.rows.map((r) => r.series))).toEqual(new Set(p.series));
      expect(p.id).toBe(`trace_${p.kind}`);
    }
    // the BEV and series templates have one fixed reduction: no gear panel (lib/notebook/templates.ts)
    expect(tracePanels(result).some((p) => p.kind === "gear")).toBe(powertrain === "conventional" || powertrain === "parallel");
    const power = tracePanels(result).find((p) => p.kind === "power")!;
    // engine / motor / generator by architecture (docs/notebook-ui.md), friction brakes always
    const expected = { conventional: ["engine"], parallel: ["engine", "motor"], series: ["engine", "motor", "generator"], bev: ["motor"] }[powertrain];
    expect(power.series).toEqual([...expected, "friction brakes"]);
  });

  test("operating points only with the engine on, never for the battery-electric car", () => {
    const pts = operatingPoints(result);
    if (powertrain === "bev") expect(pts).toEqual([]);
    for (const p of pts) expect(p.speed_rpm).toBeGreaterThan(0);
  });
});

describe("helpers", () => {
  test("thin keeps the first and last sample and the budget", () => {
    const idx = thin(10_001, 1500);
    expect(idx.length).toBe(1500);
    expect(idx[0]).toBe(0);
    expect(idx[idx.length - 1]).toBe(10_000);
    expect(thin(5, 10)).toEqual([0, 1, 2, 3, 4]);
  });

  test("a NaN in a trace never reaches a chart row", () => {
    const result = resultOf("conventional");
    const broken: Result = { ...result, traces: { ...result.traces, speed_kmh: result.traces.speed_kmh.map((v, i) => (i === 3 ? Number.NaN : v)) } };
    const speed = tracePanels(broken)[0]!;
    expect(speed.rows.every((r) => Number.isFinite(r.value))).toBe(true);
    expect(speed.rows.length).toBe(tracePanels(result)[0]!.rows.length - 1);
  });

  test("findings go to the block of their component", () => {
    expect(blockKindOfFinding({ component: "battery" })).toBe("battery_pack");
    expect(blockKindOfFinding({ component: "motor" })).toBe("electric_machine");
    expect(blockKindOfFinding({ component: "vehicle" })).toBe("body");
    expect(blockKindOfFinding({ component: "something else" })).toBeNull();
  });
});

describe("operating points of a genset at a fixed point (the demo's range extender, docs/demo.md)", () => {
  test("hundreds of steps collapse to the few points the engine really ran at", async () => {
    const { distinctPoints } = await import("@/lib/client/notebook/chart-data");
    const { demoDocument } = await import("@/lib/demo");
    const compiled = compile(readDoc(demoDocument("series-route").build()));
    const out = evaluateScenarioInput(compiled.scenario!);
    if (!out.ok) throw new Error("the demo range extender must evaluate");
    const pts = operatingPoints(out.result);
    expect(pts.length).toBeGreaterThan(100);
    const distinct = distinctPoints(pts);
    // the thermostat runs the genset at its rated 60 kW only (lib/demo/series.ts)
    expect(distinct.length).toBeLessThanOrEqual(3);
    for (const d of distinct) expect((d.speed_rpm * Math.PI / 30) * d.torque_nm / 1000).toBeGreaterThan(50);
    // every step is counted once
    expect(distinct.reduce((sum, d) => sum + d.steps, 0)).toBe(pts.length);
    expect(distinctPoints([{ speed_rpm: 1500, torque_nm: 100 }, { speed_rpm: 1503, torque_nm: 100.2 }, { speed_rpm: 1600, torque_nm: 100 }])).toEqual([
      { speed_rpm: 1500, torque_nm: 100, steps: 2 },
      { speed_rpm: 1600, torque_nm: 100, steps: 1 },
    ]);
  });
});
