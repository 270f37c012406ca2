import type { Plant } from "./plants/plant";
import type { Strategy } from "./strategies/strategy";
import { SINK_KEYS, SUPPLY_KEYS, type Ledger, type LedgerKey } from "./ledger";
import { EpisodeTracker } from "./episodes";
import { traceArray } from "./buffers";
import {
  S_AUX_W, S_BATT_CURRENT_A, S_BATT_OCV_V, S_BATT_TERMINAL_W, S_BATTERY_LOSS_W, S_BRAKES_W, S_CLUTCH_W,
  S_DRIVELINE_W, S_ENGINE_LOSS_W, S_ENGINE_ON, S_ENGINE_POWER_W, S_ENGINE_SPEED_RAD_S, S_ENGINE_TORQUE_NM,
  S_FUEL_W, S_GENERATOR_LOSS_W, S_GENERATOR_POWER_W, S_MOTOR_LOSS_W, S_MOTOR_POWER_W, S_MOTOR_TORQUE_NM,
  S_SOC_NEXT, S_UNMET_W, newStepScratch,
} from "./step-output";

/** Per-step series recorded by a run (SI; converted for the Result in result.ts). */
export interface RunTraces {
  engine_on: number[];
  engine_power_w: number[];
  engine_speed_rad_s: number[];
  engine_torque_nm: number[];
  motor_power_w: number[];
  motor_torque_nm: number[];
  generator_power_w: number[];
  battery_power_w: number[];
  battery_current_a: number[];
  brake_power_w: number[];
  soc: number[]; // at the start of each step
  fuel_w: number[];
}

export interface Run {
  traces: RunTraces;
  ledger: Ledger;
  socFinal: number;
  tracker: EpisodeTracker;
  /** Largest |supply − sinks| of a single step, W. */
  maxStepClosure_w: number;
  /** Per-step ledger in W (each key × dt gives the step's joules), when requested. */
  stepLedger: Record<LedgerKey, number[]> | null;
  engineStarts: number;
}

/** Plain arrays: they go into the Result as they are, with no copy. */
function allocTraces(n: number): RunTraces {
  return {
    engine_on: traceArray(n), engine_power_w: traceArray(n), engine_speed_rad_s: traceArray(n), engine_torque_nm: traceArray(n),
    motor_power_w: traceArray(n), motor_torque_nm: traceArray(n), generator_power_w: traceArray(n), battery_power_w: traceArray(n),
    battery_current_a: traceArray(n), brake_power_w: traceArray(n), soc: traceArray(n), fuel_w: traceArray(n),
  };
}

/**
 * Forward pass over the cycle: the strategy chooses, the plant evaluates with the exact
 * step model, the run records traces, sums the ledger and groups infeasible steps.
 * The loop allocates nothing per step.
 */
function allocStepLedger(n: number): Record<LedgerKey, number[]> {
  const out = {} as Record<LedgerKey, number[]>;
  for (const key of [...SUPPLY_KEYS, ...SINK_KEYS]) out[key] = traceArray(n);
  return out;
}

export function simulate(plant: Plant, strategy: Strategy, socInitial: number, withStepLedger = false): Run {
  const d = plant.demand;
  const n = d.n;
  const t = allocTraces(n);
  const out = newStepScratch();
  const ctl = new Float64Array(2);
  const tracker = new EpisodeTracker();
  let fuel = 0, battNet = 0, unmet = 0, brakes = 0, driveline = 0, clutch = 0, engine = 0, motor = 0;
  let generator = 0, battLoss = 0, aux = 0, maxClosure = 0, starts = 0, wasOn = 0;
  const sl = withStepLedger ? allocStepLedger(n) : null;
  let soc = socInitial;
  strategy.reset(socInitial);
  for (let k = 0; k < n; k++) {
    strategy.decide(k, soc, ctl);
    plant.apply(k, soc, ctl[0], ctl[1], out);
    const net = out[S_BATT_OCV_V] * out[S_BATT_CURRENT_A];
    const supply = out[S_FUEL_W] + net + out[S_UNMET_W];
    const sinks = d.wheel_w[k] + out[S_BRAKES_W] + out[S_DRIVELINE_W] + out[S_CLUTCH_W] + out[S_ENGINE_LOSS_W] +
      out[S_MOTOR_LOSS_W] + out[S_GENERATOR_LOSS_W] + out[S_BATTERY_LOSS_W] + out[S_AUX_W];
    const closure = Math.abs(supply - sinks);
    if (closure > maxClosure) maxClosure = closure;
    fuel += out[S_FUEL_W]; battNet += net; unmet += out[S_UNMET_W];
    brakes += out[S_BRAKES_W]; driveline += out[S_DRIVELINE_W]; clutch += out[S_CLUTCH_W];
    engine += out[S_ENGINE_LOSS_W]; motor += out[S_MOTOR_LOSS_W]; generator += out[S_GENERATOR_LOSS_W];
    battLoss += out[S_BATTERY_LOSS_W]; aux += out[S_AUX_W];
    const on = out[S_ENGINE_ON];
    if (on !== 0 && wasOn === 0 && k > 0) starts++;
    wasOn = on;
    t.engine_on[k] = on;
    t.engine_power_w[k] = out[S_ENGINE_POWER_W];
    t.engine_speed_rad_s[k] = out[S_ENGINE_SPEED_RAD_S];
    t.engine_torque_nm[k] = out[S_ENGINE_TORQUE_NM];
    t.motor_power_w[k] = out[S_MOTOR_POWER_W];
    t.motor_torque_nm[k] = out[S_MOTOR_TORQUE_NM];
    t.generator_power_w[k] = out[S_GENERATOR_POWER_W];
    t.battery_power_w[k] = out[S_BATT_TERMINAL_W];
    t.battery_current_a[k] = out[S_BATT_CURRENT_A];
    t.brake_power_w[k] = out[S_BRAKES_W];
    t.soc[k] = soc;
    t.fuel_w[k] = out[S_FUEL_W];
    tracker.step(k, out);
    if (sl !== null) {
      sl.fuel[k] = out[S_FUEL_W]; sl.battery_net[k] = net; sl.unmet_demand[k] = out[S_UNMET_W];
      sl.aero[k] = d.aero_w[k]; sl.rolling[k] = d.rolling_w[k]; sl.grade[k] = d.grade_w[k]; sl.kinetic[k] = d.inertia_w[k];
      sl.friction_brakes[k] = out[S_BRAKES_W]; sl.driveline[k] = out[S_DRIVELINE_W]; sl.clutch[k] = out[S_CLUTCH_W];
      sl.engine[k] = out[S_ENGINE_LOSS_W]; sl.motor[k] = out[S_MOTOR_LOSS_W]; sl.generator[k] = out[S_GENERATOR_LOSS_W];
      sl.battery_internal[k] = out[S_BATTERY_LOSS_W]; sl.auxiliaries[k] = out[S_AUX_W];
    }
    soc = out[S_SOC_NEXT];
  }
  tracker.finish(n - 1);
  let aero = 0, rolling = 0, grade = 0, kinetic = 0;
  for (let k = 0; k < n; k++) {
    aero += d.aero_w[k]; rolling += d.rolling_w[k]; grade += d.grade_w[k]; kinetic += d.inertia_w[k];
  }
  const dt = d.dt_s;
  const ledger: Ledger = {
    fuel: fuel * dt, battery_net: battNet * dt, unmet_demand: unmet * dt,
    aero: aero * dt, rolling: rolling * dt, grade: grade * dt, kinetic: kinetic * dt,
    friction_brakes: brakes * dt, driveline: driveline * dt, clutch: clutch * dt, engine: engine * dt,
    motor: motor * dt, generator: generator * dt, battery_internal: battLoss * dt, auxiliaries: aux * dt,
  };
  return { traces: t, ledger, socFinal: soc, tracker, maxStepClosure_w: maxClosure, engineStarts: starts, stepLedger: sl };
}
