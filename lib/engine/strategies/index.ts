import type { Plant } from "../plants/plant";
import { SeriesPlant } from "../plants/series";
import { ParallelPlant } from "../plants/parallel";
import type { Scenario } from "../scenario/schema";
import { W_PER_KW } from "../units";
import type { Strategy } from "./strategy";
import { FixedStrategy } from "./fixed";
import { ThermostatStrategy } from "./thermostat";
import { ParallelRuleStrategy } from "./parallel-rule";
import { makeOptimisingStrategy } from "./optimising";
import type { DpRunOptions } from "./dp/solve";

export type { Strategy } from "./strategy";

export type StrategyOutcome = { ok: true; strategy: Strategy } | { ok: false; kind: string; reason: string };

/**
 * Builds the energy manager named by the scenario (ECMS and DP: strategies/optimising.ts).
 * A kind that does not fit the powertrain comes back as a clear refusal.
 */
export function makeStrategy(s: Scenario, plant: Plant, run: DpRunOptions = {}): StrategyOutcome {
  const spec = s.strategy;
  if (plant.powertrain === "conventional" || plant.powertrain === "bev" || !spec) return { ok: true, strategy: new FixedStrategy(plant) };
  const b = s.battery!;
  if (spec.kind === "thermostat" && plant instanceof SeriesPlant)
    return { ok: true, strategy: new ThermostatStrategy(plant, spec.soc_on, spec.soc_off, spec.on_power_kw * W_PER_KW) };
  if (spec.kind === "rule" && plant instanceof ParallelPlant) {
    const span = b.soc_max - b.soc_min;
    return {
      ok: true,
      strategy: new ParallelRuleStrategy(plant, {
        electricSpeedMax_kmh: spec.electric_speed_max_kmh,
        socLow: spec.soc_low ?? b.soc_min + 0.3 * span,
        socHigh: spec.soc_high ?? b.soc_min + 0.7 * span,
        charge_w: spec.charge_power_kw * W_PER_KW,
        shiftTorqueFraction: spec.shift_torque_fraction,
      }),
    };
  }
  const optimising = makeOptimisingStrategy(spec, plant, run);
  if (typeof optimising === "string") return { ok: false, kind: spec.kind, reason: optimising };
  if (optimising) return { ok: true, strategy: optimising };
  return { ok: false, kind: spec.kind, reason: `strategy '${spec.kind}' is not available yet for powertrain '${plant.powertrain}'` };
}
