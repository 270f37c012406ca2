import { BLOCK_TITLES, type BlockKind } from "./block-kinds";
import { choice, libraryRef, list, num, type FieldDef } from "./fields";

export * from "./block-kinds";
export type { FieldDef, NumberField, ListField, ChoiceField, TextField } from "./fields";

const ratio = "ratio" as const;
const onlyIf = (field: string, ...values: string[]) => ({ when: { field, in: values } });

const DRIVE_CYCLE: FieldDef[] = [
  choice("source", "Source", [["standard", "Standard cycle"], ["custom", "Own speed samples"], ["library", "From the library"]], "standard",
    "A built-in standard cycle, your own speed samples, or a cycle saved in the workspace library."),
  choice("standard", "Standard cycle", [["ece15", "ECE-15 (urban)"], ["eudc", "EUDC (extra-urban)"], ["nedc", "NEDC"]], "nedc",
    "Built from the published operation tables.", "cycle.standard", onlyIf("source", "standard")),
  num("dt", "Time step", "time", "s", "cycle.dt_s", "1 s",
    "Sampling step. For a standard cycle it must divide its duration; for own samples it is their spacing.", { optional: true, ...onlyIf("source", "standard", "custom") }),
  list("speeds", "Speeds", "speed", "km/h", "cycle.speed_kmh", "0, 10, 20, 30, 30, 20, 10, 0 km/h",
    "One speed per time step, from the start; e.g. 0, 5, 10 km/h.", onlyIf("source", "custom")),
  list("grade", "Road grade", ratio, "%", "cycle.grade_pct", "",
    "Optional, one value per speed sample; positive uphill. Bare numbers are percent.", { optional: true, ...onlyIf("source", "custom") }),
  libraryRef("library_id", "Library cycle", "A drive cycle saved in the workspace library.", { kind: "cycle", ...onlyIf("source", "library") }),
];

const BODY: FieldDef[] = [
  num("mass", "Test mass", "mass", "kg", "vehicle.mass_kg", "1500 kg", "Driver and payload included."),
  num("rotating_mass_factor", "Rotating mass factor", ratio, "", "vehicle.rotating_mass_factor", "0.05",
    "Effective inertial mass = mass × (1 + factor); 5 % is written 0.05 or 5 %."),
  num("drag_coefficient", "Drag coefficient c_d", ratio, "", "vehicle.drag_coefficient", "0.30", "Aerodynamic drag coefficient."),
  num("frontal_area", "Frontal area", "area", "m²", "vehicle.frontal_area_m2", "2.2 m²", "Projected frontal area A."),
  num("rolling_resistance", "Rolling resistance c_r", ratio, "", "vehicle.rolling_resistance", "0.010", "Rolling resistance coefficient."),
  num("wheel_radius", "Wheel radius", "length", "m", "vehicle.wheel_radius_m", "0.31 m", "Dynamic rolling radius."),
  num("air_density", "Air density", "density", "kg/m³", "vehicle.air_density_kg_m3", "1.2 kg/m³", "Empty: 1.2 kg/m³.", { optional: true }),
  num("gravity", "Gravity", "acceleration", "m/s²", "vehicle.gravity_m_s2", "9.81 m/s²", "Empty: 9.81 m/s².", { optional: true }),
  num("aux_power", "Auxiliary load", "power", "W", "vehicle.aux_power_w", "300 W", "Constant auxiliary power. Empty: 0.", { optional: true }),
];

const DRIVELINE: FieldDef[] = [
  list("gear_ratios", "Gear ratios", ratio, "", "driveline.gear_ratios", "3.6, 2.1, 1.4, 1.0, 0.8", "First gear first; one gear: 1."),
  num("final_drive_ratio", "Final drive ratio", ratio, "", "driveline.final_drive_ratio", "3.9", "Axle ratio."),
  num("efficiency", "Efficiency", ratio, "", "driveline.efficiency", "0.95", "Constant driveline efficiency, e.g. 0.95 or 95 %."),
  list("upshift_speeds", "Upshift speeds", "speed", "km/h", "driveline.upshift_speeds_kmh", "15, 30, 50, 70 km/h",
    "One fewer than gears; gear = 1 + number of thresholds at or below the mean speed.", { optional: true }),
];

const ENGINE: FieldDef[] = [
  num("displacement", "Displacement", "volume", "L", "engine.displacement_l", "1.6 L", "Swept volume."),
  num("willans_efficiency", "Willans efficiency e", ratio, "", "engine.willans_efficiency", "0.40", "Slope of the Willans line p_me = e·p_mf − p_me0."),
  num("friction_mep", "Friction mean effective pressure", "pressure", "bar", "engine.friction_mep_bar", "1.5 bar", "p_me0 of the Willans line."),
  num("idle_speed", "Idle speed", "angular_speed", "rpm", "engine.idle_speed_rpm", "800 rpm", ""),
  num("max_speed", "Maximum speed", "angular_speed", "rpm", "engine.max_speed_rpm", "6000 rpm", ""),
  libraryRef("full_load_library_id", "Full-load curve", "A curve saved in the workspace library; none: the speeds and torques below.", { kind: "engine_full_load", optional: true }),
  list("full_load_speeds", "Full-load curve: speeds", "angular_speed", "rpm", "engine.max_torque_nm.speed_rpm",
    "800, 1500, 2500, 3500, 4500, 5500, 6000 rpm", "Breakpoints, increasing, from idle to maximum speed.", { unlessSet: "full_load_library_id" }),
  list("full_load_torques", "Full-load curve: torques", "torque", "N·m", "engine.max_torque_nm.torque_nm",
    "110, 135, 150, 155, 150, 140, 125 N·m", "One torque per speed breakpoint.", { unlessSet: "full_load_library_id" }),
  num("fuel_lhv", "Fuel lower heating value", "specific_energy", "MJ/kg", "engine.fuel.lhv_mj_kg", "42.7 MJ/kg", ""),
  num("fuel_density", "Fuel density", "density", "kg/L", "engine.fuel.density_kg_l", "0.745 kg/L", ""),
  num("fuel_co2", "CO2 per litre of fuel", "density", "kg/L", "engine.fuel.co2_kg_l", "2.31 kg/L", "Tank-to-wheel CO2 mass per litre burnt."),
];

const ELECTRIC_MACHINE: FieldDef[] = [
  num("peak_power", "Peak power", "power", "kW", "motor.peak_power_kw", "100 kW", ""),
  num("peak_torque", "Peak torque", "torque", "N·m", "motor.peak_torque_nm", "250 N·m", ""),
  num("max_speed", "Maximum speed", "angular_speed", "rpm", "motor.max_speed_rpm", "12000 rpm", ""),
  num("efficiency", "Efficiency", ratio, "", "motor.efficiency", "0.90", "Constant, motoring and generating."),
];

const GENERATOR_SET: FieldDef[] = [
  num("peak_power", "Peak electrical power", "power", "kW", "generator.peak_power_kw", "60 kW", "The engine of the Engine block drives it."),
  num("efficiency", "Generator efficiency", ratio, "", "generator.efficiency", "0.92", ""),
];

const BATTERY_PACK: FieldDef[] = [
  num("capacity", "Capacity", "charge", "Ah", "battery.capacity_ah", "30 Ah", "Charge capacity (Ah, not kWh)."),
  libraryRef("ocv_library_id", "Open-circuit voltage", "An OCV curve saved in the workspace library; none: the points below.", { kind: "battery_ocv", optional: true }),
  list("ocv_soc", "Open-circuit voltage: SOC points", ratio, "", "battery.ocv.soc", "0, 0.5, 1", "Increasing, within 0…1 (or 0 %, 50 %, 100 %).", { unlessSet: "ocv_library_id" }),
  list("ocv_voltage", "Open-circuit voltage: voltages", "voltage", "V", "battery.ocv.voltage_v", "320, 360, 400 V", "One voltage per SOC point.", { unlessSet: "ocv_library_id" }),
  num("resistance", "Internal resistance", "resistance", "Ω", "battery.resistance_ohm", "0.10 Ω", "Pack resistance."),
  num("soc_initial", "Initial SOC", ratio, "", "battery.soc_initial", "0.60", ""),
  num("soc_min", "Minimum SOC", ratio, "", "battery.soc_min", "0.30", ""),
  num("soc_max", "Maximum SOC", ratio, "", "battery.soc_max", "0.80", ""),
  num("max_discharge_c", "Maximum discharge rate", "c_rate", "C", "battery.max_discharge_c", "5 C", "Current limit as C-rate."),
  num("max_charge_c", "Maximum charge rate", "c_rate", "C", "battery.max_charge_c", "3 C", "Current limit as C-rate."),
];

const ENERGY_MANAGER: FieldDef[] = [
  choice("kind", "Strategy", [["thermostat", "Thermostat (series)"], ["rule", "Rule (parallel)"], ["ecms", "ECMS"], ["dp", "Dynamic programming (offline optimum)"]],
    "ecms", "How the power split is chosen.", "strategy.kind"),
  num("soc_on", "Engine on at SOC", ratio, "", "strategy.soc_on", "0.40", "", onlyIf("kind", "thermostat")),
  num("soc_off", "Engine off at SOC", ratio, "", "strategy.soc_off", "0.70", "", onlyIf("kind", "thermostat")),
  num("on_power", "Generator power when on", "power", "kW", "strategy.on_power_kw", "30 kW", "", onlyIf("kind", "thermostat")),
  num("electric_speed_max", "Electric driving up to", "speed", "km/h", "strategy.electric_speed_max_kmh", "30 km/h", "", { optional: true, ...onlyIf("kind", "rule") }),
  num("soc_low", "Charge below SOC", ratio, "", "strategy.soc_low", "", "Empty: derived from the battery window.", { optional: true, ...onlyIf("kind", "rule") }),
  num("soc_high", "Stop charging above SOC", ratio, "", "strategy.soc_high", "", "Empty: derived from the battery window.", { optional: true, ...onlyIf("kind", "rule") }),
  num("charge_power", "Charging power", "power", "kW", "strategy.charge_power_kw", "5 kW", "", { optional: true, ...onlyIf("kind", "rule") }),
  num("equivalence_factor", "Equivalence factor s0", ratio, "", "strategy.equivalence_factor", "2.5", "Weight of battery chemical power against fuel power.", onlyIf("kind", "ecms")),
  num("soc_feedback_gain", "SOC feedback gain k", ratio, "", "strategy.soc_feedback_gain", "5", "s = s0 + k·(target − SOC).", { optional: true, ...onlyIf("kind", "ecms") }),
  num("soc_target", "Target SOC", ratio, "", "strategy.soc_target", "0.60", "", onlyIf("kind", "ecms")),
  num("control_points", "Control candidates", "count", "", "strategy.control_points", "41", "Candidates per step.", { optional: true, integer: true, ...onlyIf("kind", "ecms", "dp") }),
  num("soc_points", "SOC grid points", "count", "", "strategy.soc_points", "201", "", { optional: true, integer: true, ...onlyIf("kind", "dp") }),
  num("soc_final_min", "Final SOC at least", ratio, "", "strategy.soc_final_min", "0.58", "", onlyIf("kind", "dp")),
  num("soc_final_max", "Final SOC at most", ratio, "", "strategy.soc_final_max", "0.62", "", onlyIf("kind", "dp")),
];

/** Field catalogue per kind. Parameters blocks are free-form (name → text); notes and views have none. */
export const FIELDS: Record<BlockKind, readonly FieldDef[]> = {
  drive_cycle: DRIVE_CYCLE, body: BODY, driveline: DRIVELINE, engine: ENGINE, electric_machine: ELECTRIC_MACHINE,
  generator_set: GENERATOR_SET, battery_pack: BATTERY_PACK, energy_manager: ENERGY_MANAGER,
  parameters: [], note: [], headline_figures: [], loss_ledger: [], energy_flow: [], traces: [], operating_points: [], strategy_comparison: [],
};

export function fieldsOf(kind: BlockKind): readonly FieldDef[] {
  return FIELDS[kind];
}

export function fieldOf(kind: BlockKind, key: string): FieldDef | undefined {
  return FIELDS[kind].find((f) => f.key === key);
}

/** Is the field active given the block's current choice values (and library references)? */
export function fieldActive(field: FieldDef, params: Readonly<Record<string, string>>, kind: BlockKind): boolean {
  if (field.unlessSet && (params[field.unlessSet] ?? "").trim() !== "") return false;
  if (!field.when) return true;
  const driver = fieldOf(kind, field.when.field);
  const current = (params[field.when.field] ?? driver?.default ?? "").trim();
  return field.when.in.includes(current);
}

/** "Battery pack › capacity" */
export function fieldLabel(kind: BlockKind, key: string): string {
  const f = fieldOf(kind, key);
  const label = f ? f.label : key;
  // "Initial SOC" → "initial SOC", but "CO2 per litre" stays
  const lower = /^[A-Z][a-z]/.test(label) ? label.charAt(0).toLowerCase() + label.slice(1) : label;
  return `${BLOCK_TITLES[kind]} › ${lower}`;
}
