import * as Y from "yjs";
import { POWERTRAIN_LABELS, type BlockKind, type PowertrainKind } from "./block-kinds";
import { insertBlock, setMeta, type BlockInit } from "./model";

/**
 * Starting documents: a midsize passenger car per powertrain. Values are round concept-stage
 * figures (common practice, no source), chosen so every template compiles and the engine
 * accepts it; teams replace them with their own data.
 */
type Step = [BlockKind, BlockInit?];

const CAR_PARAMETERS: Step = ["parameters", {
  params: { curb_mass: "1420 kg", payload: "80 kg" },
  note: "Shared values. Other blocks refer to them by name, e.g. curb_mass + payload.",
}];

const body = (powertrain: string): Step => ["body", {
  params: { mass: "curb_mass + payload" },
  note: `Test mass of the ${powertrain} car: kerb mass plus driver and payload (see Parameters).`,
}];

const SPARK_ENGINE: BlockInit = {
  params: {
    displacement: "1.6 L", willans_efficiency: "0.40", friction_mep: "1.5 bar", idle_speed: "800 rpm", max_speed: "6000 rpm",
    full_load_speeds: "800, 1500, 2500, 3500, 4500, 5500, 6000 rpm",
    full_load_torques: "110, 135, 150, 155, 150, 140, 125 N·m",
  },
};

const VIEWS: Step[] = [["headline_figures"], ["loss_ledger"], ["traces"]];

const SINGLE_GEAR: BlockInit = {
  params: { gear_ratios: "1", final_drive_ratio: "8.5", efficiency: "0.97", upshift_speeds: "" },
  note: "One fixed reduction.",
};

const TEMPLATES: Record<PowertrainKind, (label: string) => Step[]> = {
  conventional: (m) => [
    ["note", { note: "Midsize petrol car with a five-speed manual gearbox on the NEDC." }],
    CAR_PARAMETERS, ["drive_cycle"], body(m), ["driveline"], ["engine", SPARK_ENGINE], ...VIEWS, ["operating_points"],
  ],
  bev: (m) => [
    ["note", { note: "Midsize battery-electric car, about 58 kWh pack (160 Ah at 360 V nominal)." }],
    ["parameters", { params: { curb_mass: "1720 kg", payload: "80 kg" } }],
    ["drive_cycle"], body(m), ["driveline", SINGLE_GEAR],
    ["electric_machine", { params: { peak_power: "110 kW", peak_torque: "260 N·m", max_speed: "12000 rpm", efficiency: "0.90" } }],
    ["battery_pack", { params: {
      capacity: "160 Ah", ocv_soc: "0, 0.1, 0.5, 0.9, 1", ocv_voltage: "320, 340, 360, 385, 395 V", resistance: "0.08 Ω",
      soc_initial: "0.90", soc_min: "0.10", soc_max: "0.95", max_discharge_c: "3 C", max_charge_c: "1.5 C",
    } }],
    ...VIEWS, ["energy_flow"],
  ],
  parallel: (m) => [
    ["note", { note: "Midsize parallel hybrid: the petrol engine and a 30 kW motor share the gearbox input shaft; 1.6 kWh pack." }],
    ["parameters", { params: { curb_mass: "1520 kg", payload: "80 kg" } }],
    ["drive_cycle"], body(m), ["driveline"], ["engine", SPARK_ENGINE],
    ["electric_machine", { params: { peak_power: "30 kW", peak_torque: "150 N·m", max_speed: "6000 rpm", efficiency: "0.90" } }],
    ["battery_pack", { params: {
      capacity: "6.5 Ah", ocv_soc: "0, 0.5, 1", ocv_voltage: "220, 245, 265 V", resistance: "0.15 Ω",
      soc_initial: "0.60", soc_min: "0.40", soc_max: "0.80", max_discharge_c: "20 C", max_charge_c: "15 C",
    } }],
    // the rule as the engine defines it (docs/engine.md); ECMS values are prefilled for a switch
    ["energy_manager", { params: { kind: "rule", electric_speed_max: "50 km/h", charge_power: "0.5 kW" } }],
    ...VIEWS, ["strategy_comparison"],
  ],
  series: (m) => [
    ["note", { note: "Midsize series hybrid: a 1.2 L engine drives a 60 kW generator; a 110 kW motor drives the wheels; 5.4 kWh pack." }],
    ["parameters", { params: { curb_mass: "1650 kg", payload: "80 kg" } }],
    ["drive_cycle"], body(m), ["driveline", SINGLE_GEAR],
    ["engine", { params: {
      ...SPARK_ENGINE.params, displacement: "1.2 L",
      full_load_torques: "85, 105, 115, 120, 118, 110, 100 N·m",
    } }],
    ["generator_set", { params: { peak_power: "60 kW", efficiency: "0.92" } }],
    ["electric_machine", { params: { peak_power: "110 kW", peak_torque: "260 N·m", max_speed: "12000 rpm", efficiency: "0.90" } }],
    ["battery_pack", { params: {
      capacity: "15 Ah", ocv_soc: "0, 0.5, 1", ocv_voltage: "320, 360, 400 V", resistance: "0.10 Ω",
      soc_initial: "0.55", soc_min: "0.30", soc_max: "0.80", max_discharge_c: "5 C", max_charge_c: "3 C",
    } }],
    ["energy_manager", { params: { kind: "thermostat", soc_on: "0.50", soc_off: "0.58", on_power: "20 kW", soc_target: "0.55" } }],
    ...VIEWS, ["strategy_comparison"],
  ],
};

export interface TemplateOptions {
  /** texts that replace the template's, per block kind: { body: { mass: "3500 kg" } } */
  params?: Partial<Record<BlockKind, Record<string, string>>>;
  /** notes that replace the template's, per block kind */
  notes?: Partial<Record<BlockKind, string>>;
}

/**
 * Fills `doc` (default: a new one) with the template blocks and meta; returns the doc.
 * `options` adapts a template (the demo's van documents start from the car templates).
 */
export function createScenarioDoc(powertrain: PowertrainKind, name: string, doc: Y.Doc = new Y.Doc(), options: TemplateOptions = {}): Y.Doc {
  doc.transact(() => {
    setMeta(doc, { name, powertrain });
    for (const [kind, init] of TEMPLATES[powertrain](POWERTRAIN_LABELS[powertrain])) {
      const params = { ...(init?.params ?? {}), ...(options.params?.[kind] ?? {}) };
      const note = options.notes?.[kind] ?? init?.note;
      insertBlock(doc, kind, undefined, { ...init, params, note });
    }
  });
  return doc;
}
