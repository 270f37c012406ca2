import { z } from "zod";

/**
 * Scenario format v1 (DESIGN §3): the shape only. Cross-field rules (schedule vs gears,
 * breakpoint order, components per powertrain, SOC window) live in rules.ts so that every
 * message can name the field, the value and the rule in our own words.
 * Objects are strict: a misspelt field is an error rather than a silently ignored value.
 */
export const SCENARIO_FORMAT_V1 = "joulebook.scenario/1";

const num = z.number();
const positive = num.positive();
const nonNegative = num.min(0);
const efficiency = positive.max(1);
const fraction = num.min(0).max(1);

export const cycleSchema = z.strictObject({
  standard: z.enum(["ece15", "eudc", "nedc"]).optional(),
  dt_s: positive.optional(),
  speed_kmh: z.array(nonNegative).optional(),
  grade_pct: z.array(num).optional(),
});

export const vehicleSchema = z.strictObject({
  mass_kg: positive,
  rotating_mass_factor: nonNegative,
  drag_coefficient: positive,
  frontal_area_m2: positive,
  rolling_resistance: nonNegative,
  wheel_radius_m: positive,
  air_density_kg_m3: positive.default(1.2),
  gravity_m_s2: positive.default(9.81),
  aux_power_w: nonNegative.default(0),
});

export const drivelineSchema = z.strictObject({
  gear_ratios: z.array(positive).min(1),
  final_drive_ratio: positive,
  efficiency,
  upshift_speeds_kmh: z.array(positive).default([]),
});

export const fuelSchema = z.strictObject({
  lhv_mj_kg: positive,
  density_kg_l: positive,
  co2_kg_l: nonNegative,
});

export const engineSchema = z.strictObject({
  displacement_l: positive,
  willans_efficiency: efficiency,
  friction_mep_bar: nonNegative,
  idle_speed_rpm: positive,
  max_speed_rpm: positive,
  max_torque_nm: z.strictObject({ speed_rpm: z.array(nonNegative).min(2), torque_nm: z.array(nonNegative).min(2) }),
  fuel: fuelSchema,
});

export const motorSchema = z.strictObject({
  peak_power_kw: positive,
  peak_torque_nm: positive,
  max_speed_rpm: positive,
  efficiency,
});

export const generatorSchema = z.strictObject({ peak_power_kw: positive, efficiency });

export const batterySchema = z.strictObject({
  capacity_ah: positive,
  ocv: z.strictObject({ soc: z.array(fraction).min(2), voltage_v: z.array(positive).min(2) }),
  resistance_ohm: nonNegative,
  soc_initial: fraction,
  soc_min: fraction,
  soc_max: fraction,
  max_discharge_c: positive,
  max_charge_c: positive,
});

const controlPoints = z.number().int().min(2).max(1001);

export const strategySchema = z.discriminatedUnion("kind", [
  z.strictObject({
    kind: z.literal("thermostat"),
    soc_on: fraction,
    soc_off: fraction,
    on_power_kw: positive,
  }),
  z.strictObject({
    // Parallel-hybrid fixed rule (docs/engine.md). Optional fields fall back to values
    // derived from the battery window at evaluation time.
    kind: z.literal("rule"),
    electric_speed_max_kmh: nonNegative.default(50),
    soc_low: fraction.optional(),
    soc_high: fraction.optional(),
    charge_power_kw: nonNegative.default(1),
    // Optional load-point shifting (docs/strategies.md): while charging, raise the engine
    // torque towards this fraction of its full-load torque (its efficient region) instead
    // of adding charge_power_kw. Absent: the fixed charge power above.
    shift_torque_fraction: fraction.optional(),
  }),
  z.strictObject({
    kind: z.literal("ecms"),
    equivalence_factor: positive,
    soc_feedback_gain: num.default(0),
    soc_target: fraction,
    control_points: controlPoints.default(41),
  }),
  z.strictObject({
    kind: z.literal("dp"),
    soc_points: z.number().int().min(2).max(10001).default(201),
    control_points: controlPoints.default(41),
    soc_final_min: fraction,
    soc_final_max: fraction,
  }),
]);

export const scenarioSchema = z.strictObject({
  format: z.literal(SCENARIO_FORMAT_V1),
  name: z.string().max(200).default("Untitled scenario"),
  powertrain: z.enum(["conventional", "bev", "parallel", "series"]),
  cycle: cycleSchema,
  vehicle: vehicleSchema,
  driveline: drivelineSchema,
  engine: engineSchema.optional(),
  motor: motorSchema.optional(),
  generator: generatorSchema.optional(),
  battery: batterySchema.optional(),
  strategy: strategySchema.optional(),
});

export type Scenario = z.output<typeof scenarioSchema>;
export type ScenarioInput = z.input<typeof scenarioSchema>;
export type Powertrain = Scenario["powertrain"];
export type CycleSpec = z.output<typeof cycleSchema>;
export type Vehicle = z.output<typeof vehicleSchema>;
export type Driveline = z.output<typeof drivelineSchema>;
export type EngineSpec = z.output<typeof engineSchema>;
export type MotorSpec = z.output<typeof motorSchema>;
export type GeneratorSpec = z.output<typeof generatorSchema>;
export type BatterySpec = z.output<typeof batterySchema>;
export type StrategySpec = z.output<typeof strategySchema>;
export type StrategyKind = StrategySpec["kind"];
