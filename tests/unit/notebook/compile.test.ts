import { describe, expect, it } from "vitest";
import * as Y from "yjs";
import { parseScenario } from "@/lib/engine/scenario";
import { compile } from "@/lib/notebook/compile";
import { findBlock, insertBlock, readBlocks, readDoc, removeBlock, setMeta, setParam } from "@/lib/notebook/model";
import { createScenarioDoc } from "@/lib/notebook/templates";
import { POWERTRAINS, REQUIRED_KINDS, type BlockKind, type PowertrainKind } from "@/lib/notebook/blocks";

function idOf(doc: Y.Doc, kind: BlockKind): string {
  const b = readBlocks(doc).find((x) => x.kind === kind);
  if (!b) throw new Error(`no ${kind} block`);
  return b.id;
}
const errors = (doc: Y.Doc) => compile(readDoc(doc)).messages.filter((m) => m.severity === "error");

describe("templates compile to a scenario the engine accepts", () => {
  for (const pt of POWERTRAINS) {
    it(pt, () => {
      const r = compile(readDoc(createScenarioDoc(pt, `Car ${pt}`)));
      expect(r.messages).toEqual([]);
      expect(r.scenario).toBeDefined();
      const parsed = parseScenario(r.scenario);
      expect(parsed.ok).toBe(true);
      expect(r.scenario).toMatchObject({ format: "joulebook.scenario/1", powertrain: pt, name: `Car ${pt}` });
    });
  }
});

describe("the DESIGN §3 example, typed into blocks, compiles to exactly that scenario", () => {
  it("conventional", () => {
    const doc = new Y.Doc();
    setMeta(doc, { name: "Example", powertrain: "conventional" });
    insertBlock(doc, "drive_cycle", undefined, { params: { source: "standard", standard: "nedc", dt: "" } });
    insertBlock(doc, "body", undefined, { params: {
      mass: "1.6 t", rotating_mass_factor: "5 %", drag_coefficient: "0.30", frontal_area: "2.2 m^2", rolling_resistance: "0.010",
      wheel_radius: "310 mm", air_density: "1.2", gravity: "9.81", aux_power: "0.3 kW",
    } });
    insertBlock(doc, "driveline", undefined, { params: {
      gear_ratios: "3.6, 2.1, 1.4, 1.0, 0.8", final_drive_ratio: "3.9", efficiency: "95 %", upshift_speeds: "15, 30, 50, 70",
    } });
    insertBlock(doc, "engine", undefined, { params: {
      displacement: "1600 cm³", willans_efficiency: "0.40", friction_mep: "150 kPa", idle_speed: "800", max_speed: "6000 rpm",
      full_load_speeds: "800, 3000, 6000", full_load_torques: "100, 150, 120 Nm",
      fuel_lhv: "42.7", fuel_density: "745 g/L", fuel_co2: "2.31",
    } });
    const r = compile(readDoc(doc));
    expect(r.messages).toEqual([]);
    expect(r.scenario).toEqual({
      format: "joulebook.scenario/1", name: "Example", powertrain: "conventional",
      cycle: { standard: "nedc" },
      vehicle: {
        mass_kg: 1600, rotating_mass_factor: 0.05, drag_coefficient: 0.30, frontal_area_m2: 2.2, rolling_resistance: 0.010,
        wheel_radius_m: 0.31, air_density_kg_m3: 1.2, gravity_m_s2: 9.81, aux_power_w: 300,
      },
      driveline: { gear_ratios: [3.6, 2.1, 1.4, 1.0, 0.8], final_drive_ratio: 3.9, efficiency: 0.95, upshift_speeds_kmh: [15, 30, 50, 70] },
      engine: {
        displacement_l: 1.6, willans_efficiency: 0.40, friction_mep_bar: 1.5, idle_speed_rpm: 800, max_speed_rpm: 6000,
        max_torque_nm: { speed_rpm: [800, 3000, 6000], torque_nm: [100, 150, 120] },
        fuel: { lhv_mj_kg: 42.7, density_kg_l: 0.745, co2_kg_l: 2.31 },
      },
    });
  });
});

describe("missing blocks per powertrain", () => {
  const expected: Record<PowertrainKind, string> = {
    conventional: "the conventional", bev: "the battery-electric", parallel: "the parallel hybrid", series: "the series hybrid",
  };
  for (const pt of POWERTRAINS) {
    for (const kind of REQUIRED_KINDS[pt]) {
      it(`${pt} without ${kind}`, () => {
        const doc = createScenarioDoc(pt, "x");
        removeBlock(doc, idOf(doc, kind));
        const r = compile(readDoc(doc));
        expect(r.scenario).toBeUndefined();
        const texts = r.messages.filter((m) => m.severity === "error").map((m) => m.text);
        // one message for the missing block, none echoed back from the engine
        expect(texts).toHaveLength(1);
        expect(texts[0]).toMatch(new RegExp(`^${expected[pt]} needs an? [a-z &]+ block$`));
      });
    }
  }
  it("the wording of one case in full", () => {
    const doc = createScenarioDoc("series", "x");
    removeBlock(doc, idOf(doc, "generator_set"));
    expect(errors(doc)[0].text).toBe("the series hybrid needs a generator set block");
  });
});

describe("messages attach to block and field", () => {
  it("a dimension mismatch", () => {
    const doc = createScenarioDoc("bev", "x");
    const id = idOf(doc, "battery_pack");
    setParam(doc, id, "capacity", "15 kWh");
    expect(errors(doc)).toEqual([{
      // at: the unit in "15 kWh"
      blockId: id, field: "capacity", severity: "error", at: 3,
      text: "Battery pack › capacity: expected Ah (charge), got kWh (energy)",
    }]);
  });

  it("a formula's parse error with its character position", () => {
    const doc = createScenarioDoc("conventional", "x");
    const id = idOf(doc, "body");
    setParam(doc, id, "mass", "curb_mass + (payload");
    expect(errors(doc)).toEqual([{ blockId: id, field: "mass", severity: "error", at: 20, text: "Body & road load › test mass: missing )" }]);
  });

  it("a second block of one kind", () => {
    const doc = createScenarioDoc("conventional", "x");
    const second = insertBlock(doc, "engine");
    const e = errors(doc);
    expect(e).toHaveLength(1);
    expect(e[0].blockId).toBe(second);
    expect(e[0].text).toMatch(/^a second Engine block/);
  });

  it("parameter errors point at the Parameters block and the name", () => {
    const doc = createScenarioDoc("conventional", "x");
    const pid = idOf(doc, "parameters");
    setParam(doc, pid, "curb_mass", "payload * 10");
    setParam(doc, pid, "payload", "curb_mass / 10");
    const e = errors(doc);
    expect(e.filter((m) => m.blockId === pid).map((m) => m.field).sort()).toEqual(["curb_mass", "payload"]);
    expect(e[0].text).toContain("cycle: ");
    // the body's mass uses them and says so
    expect(e.some((m) => m.field === "mass" && /parameter "curb_mass" has an error/.test(m.text))).toBe(true);
  });

  it("engine rules come back on the field that wrote the value", () => {
    const doc = createScenarioDoc("parallel", "x");
    setParam(doc, idOf(doc, "battery_pack"), "soc_initial", "0.9");
    setParam(doc, idOf(doc, "driveline"), "upshift_speeds", "15, 30 km/h");
    setParam(doc, idOf(doc, "engine"), "full_load_speeds", "1000, 1500, 2500, 3500, 4500, 5500, 6000 rpm");
    const e = errors(doc);
    const where = e.map((m) => `${m.blockId === idOf(doc, "battery_pack") ? "battery" : m.blockId === idOf(doc, "driveline") ? "driveline" : "engine"}.${m.field}`);
    expect(where.sort()).toEqual(["battery.soc_initial", "driveline.upshift_speeds", "engine.full_load_speeds"]);
    expect(e.find((m) => m.field === "soc_initial")!.text).toMatch(/^Battery pack › initial SOC: must lie in the window/);
  });

  it("a strategy the powertrain does not support", () => {
    const doc = createScenarioDoc("parallel", "x");
    const id = idOf(doc, "energy_manager");
    setParam(doc, id, "kind", "thermostat");
    expect(errors(doc)).toEqual([expect.objectContaining({ blockId: id, field: "kind", text: expect.stringContaining("supports rule, ecms, dp") })]);
  });

  it("a component the powertrain does not use is a warning, the scenario still compiles", () => {
    const doc = createScenarioDoc("conventional", "x");
    const id = insertBlock(doc, "electric_machine");
    const r = compile(readDoc(doc));
    expect(r.scenario).toBeDefined();
    expect(r.scenario).not.toHaveProperty("motor");
    expect(r.messages).toEqual([{ blockId: id, severity: "warning", text: "Electric machine: not used by the conventional" }]);
  });

  it("an empty required field", () => {
    const doc = createScenarioDoc("bev", "x");
    const id = idOf(doc, "electric_machine");
    setParam(doc, id, "peak_power", "");
    expect(errors(doc)).toEqual([expect.objectContaining({ blockId: id, field: "peak_power", text: "Electric machine › peak power: is empty" })]);
  });

  it("no powertrain chosen", () => {
    const doc = new Y.Doc();
    expect(compile(readDoc(doc)).messages[0].text).toMatch(/^choose a powertrain/);
  });

  it("the source table maps scenario paths to blocks and fields", () => {
    const doc = createScenarioDoc("series", "x");
    const r = compile(readDoc(doc));
    expect(r.sources.get("battery.capacity_ah")).toEqual({ blockId: idOf(doc, "battery_pack"), kind: "battery_pack", field: "capacity" });
    expect(r.sources.get("engine.max_torque_nm.torque_nm")?.field).toBe("full_load_torques");
    // series template: curb_mass 1650 kg + payload 80 kg
    expect(r.values.get(idOf(doc, "body"))?.mass).toBe(1730);
    expect(r.values.get(idOf(doc, "battery_pack"))?.ocv_voltage).toEqual([320, 360, 400]);
  });
});

describe("drive cycle block", () => {
  it("own speed samples with a unit and a grade", () => {
    const doc = createScenarioDoc("bev", "x");
    const id = idOf(doc, "drive_cycle");
    setParam(doc, id, "source", "custom");
    setParam(doc, id, "dt", "0.5 s");
    setParam(doc, id, "speeds", "0, 5, 10, 5, 0 m/s");
    setParam(doc, id, "grade", "0, 1, 2, 1, 0");
    const r = compile(readDoc(doc));
    expect(r.messages).toEqual([]);
    expect(r.scenario?.cycle).toEqual({ dt_s: 0.5, speed_kmh: [0, 18, 36, 18, 0], grade_pct: [0, 1, 2, 1, 0] });
  });
  it("a grade list of the wrong length is reported on the grade field", () => {
    const doc = createScenarioDoc("bev", "x");
    const id = idOf(doc, "drive_cycle");
    setParam(doc, id, "source", "custom");
    setParam(doc, id, "grade", "0, 1");
    expect(errors(doc)).toEqual([expect.objectContaining({ blockId: id, field: "grade" })]);
  });
  it("library cycles are not available yet, and it says so", () => {
    const doc = createScenarioDoc("bev", "x");
    const id = idOf(doc, "drive_cycle");
    setParam(doc, id, "source", "library");
    expect(errors(doc)).toEqual([expect.objectContaining({ blockId: id, field: "library_id", text: expect.stringContaining("not available yet") })]);
  });
  it("a time step that does not divide the standard cycle", () => {
    const doc = createScenarioDoc("bev", "x");
    const id = idOf(doc, "drive_cycle");
    setParam(doc, id, "dt", "7 s");
    expect(errors(doc)).toEqual([expect.objectContaining({ blockId: id, field: "dt" })]);
    expect(findBlock(doc, id)).toBeDefined();
  });
});
