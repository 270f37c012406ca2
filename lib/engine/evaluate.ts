import type { Scenario } from "./scenario/schema";
import { parseScenario } from "./scenario/parse";
import type { ScenarioError } from "./scenario/errors";
import { prepare } from "./build";
import { makeStrategy } from "./strategies";
import { simulate, type Run } from "./simulate";
import { cycleStats } from "./cycles/stats";
import { closureError_j } from "./ledger";
import { chargeSustainingWarning, infeasibleFindings, parameterWarnings, socPinnedWarnings, unusedBlockWarnings } from "./findings";
import { RESULT_FORMAT_V1, type Kpi, type Result, type Traces } from "./result";
import type { Demand } from "./demand";
import { G_PER_KG, J_PER_KWH, radSToRpm } from "./units";
import { demandOverflow, ledgerOverflow } from "./overflow";

export type EvaluateOutcome = { ok: true; result: Result } | { ok: false; errors: ScenarioError[] };

function toArray(a: Float64Array, scale = 1): number[] {
  const out = new Array<number>(a.length);
  for (let i = 0; i < a.length; i++) out[i] = a[i] * scale;
  return out;
}

function bytesToArray(a: Uint8Array): number[] {
  const out = new Array<number>(a.length);
  for (let i = 0; i < a.length; i++) out[i] = a[i];
  return out;
}

/** Scales a run trace in place (it belongs to this evaluation only). */
function scaled(a: number[], scale: number): number[] {
  if (scale !== 1) for (let i = 0; i < a.length; i++) a[i] *= scale;
  return a;
}

function traces(d: Demand, run: Run, lhv_j_per_g: number): Traces {
  const t = run.traces;
  return {
    time_s: toArray(d.time_s),
    speed_kmh: toArray(d.speed_m_s, 3.6),
    gear: bytesToArray(d.gear),
    wheel_power_w: toArray(d.wheel_w),
    brake_power_w: t.brake_power_w,
    engine_on: t.engine_on,
    engine_power_w: t.engine_power_w,
    engine_speed_rpm: scaled(t.engine_speed_rad_s, radSToRpm(1)),
    engine_torque_nm: t.engine_torque_nm,
    motor_power_w: t.motor_power_w,
    motor_torque_nm: t.motor_torque_nm,
    generator_power_w: t.generator_power_w,
    battery_power_w: t.battery_power_w,
    battery_current_a: t.battery_current_a,
    soc: t.soc,
    fuel_rate_g_s: scaled(t.fuel_w, lhv_j_per_g > 0 ? 1 / lhv_j_per_g : 0),
  };
}

function maxAbs(a: readonly number[]): number {
  let m = 0;
  for (let i = 0; i < a.length; i++) if (Math.abs(a[i]) > m) m = Math.abs(a[i]);
  return m;
}

function kpi(s: Scenario, d: Demand, run: Run): Kpi {
  const km = d.distance_m / 1000;
  const perKm = (x: number) => (km > 0 ? x / km : null);
  const fuel = s.engine?.fuel;
  const fuel_g = fuel ? run.ledger.fuel / (fuel.lhv_mj_kg * 1e3) : 0;
  const fuel_l = fuel ? fuel_g / G_PER_KG / fuel.density_kg_l : 0;
  const battery_net_kwh = run.ledger.battery_net / J_PER_KWH;
  const b = s.battery && s.powertrain !== "conventional" ? s.battery : null;
  const feasible = run.tracker.infeasibleSteps === 0;
  return {
    distance_km: km,
    duration_s: d.n * d.dt_s,
    fuel_g,
    fuel_l,
    fuel_l_per_100km: perKm(fuel_l * 100),
    co2_g_per_km: perKm(fuel ? fuel_l * fuel.co2_kg_l * G_PER_KG : 0),
    battery_net_kwh,
    electric_kwh_per_100km: perKm(battery_net_kwh * 100),
    soc_initial: b ? b.soc_initial : null,
    soc_final: b ? run.socFinal : null,
    feasible,
    infeasible_steps: run.tracker.infeasibleSteps,
    engine_starts: run.engineStarts,
    max_c_rate: b ? maxAbs(run.traces.battery_current_a) / b.capacity_ah : null,
  };
}

export interface EvaluateOptions {
  /** Add `step_ledger_w` (15 arrays of N) to the Result. */
  stepLedger?: boolean;
  /** Long runs (DP): cancel, and the share of backward steps done (strategies/dp). */
  signal?: AbortSignal;
  onProgress?: (share: number) => void;
}

/**
 * Evaluates a validated scenario. Fails only for a strategy kind this build lacks, a DP too
 * large for memory, or magnitudes beyond double precision (overflow.ts).
 */
export function evaluateScenario(s: Scenario, options: EvaluateOptions = {}): EvaluateOutcome {
  const { cycle, demand, plant } = prepare(s);
  const overflow = demandOverflow(demand);
  if (overflow) return { ok: false, errors: [overflow] };
  const made = makeStrategy(s, plant, { signal: options.signal, onProgress: options.onProgress });
  if (!made.ok) {
    const message = `strategy.kind: ${made.reason}`;
    return { ok: false, errors: [{ path: "strategy.kind", value: made.kind, rule: made.reason, message }] };
  }
  const socInitial = s.battery && s.powertrain !== "conventional" ? s.battery.soc_initial : 0;
  const run = simulate(plant, made.strategy, socInitial, options.stepLedger === true);
  const ledgerError = ledgerOverflow(run.ledger);
  if (ledgerError) return { ok: false, errors: [ledgerError] };
  const v = s.vehicle;
  const stats = cycleStats(cycle, {
    inertial_mass_kg: v.mass_kg * (1 + v.rotating_mass_factor), mass_kg: v.mass_kg,
    drag_area_m2: v.drag_coefficient * v.frontal_area_m2, air_density_kg_m3: v.air_density_kg_m3,
    rolling_resistance: v.rolling_resistance, gravity_m_s2: v.gravity_m_s2,
  });
  const findings = infeasibleFindings(run.tracker.episodes, demand);
  const cs = chargeSustainingWarning(s, run.ledger, socInitial, run.socFinal);
  if (cs) findings.push(cs);
  findings.push(...socPinnedWarnings(s, run.traces.soc, run.socFinal), ...unusedBlockWarnings(s), ...parameterWarnings(s));
  findings.push(...(made.strategy.findings?.(run) ?? []));
  const e = s.powertrain === "bev" ? undefined : s.engine;
  const result: Result = {
    format: RESULT_FORMAT_V1,
    name: s.name,
    powertrain: s.powertrain,
    strategy: s.powertrain === "parallel" || s.powertrain === "series" ? (s.strategy?.kind ?? null) : null,
    kpi: kpi(s, demand, run),
    ledger_j: run.ledger,
    closure_error_j: closureError_j(run.ledger),
    closure_error_max_step_w: run.maxStepClosure_w,
    findings,
    ...(run.stepLedger ? { step_ledger_w: run.stepLedger } : {}),
    cycle: { ...stats, dt_s: cycle.dt_s, steps: demand.n },
    traces: traces(demand, run, e ? e.fuel.lhv_mj_kg * 1e3 : 0),
    curves: {
      engine_full_load: e ? { speed_rpm: [...e.max_torque_nm.speed_rpm], torque_nm: [...e.max_torque_nm.torque_nm] } : null,
      engine_max_speed_rpm: e ? e.max_speed_rpm : null,
      engine_idle_speed_rpm: e ? e.idle_speed_rpm : null,
    },
  };
  return { ok: true, result };
}

/** The one call for the API route and the CLI: unknown JSON in, Result or errors out. */
export function evaluateScenarioInput(input: unknown, options: EvaluateOptions = {}): EvaluateOutcome {
  const parsed = parseScenario(input);
  if (!parsed.ok) return parsed;
  return evaluateScenario(parsed.scenario, options);
}
