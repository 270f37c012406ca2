import type { Plant } from "../plants/plant";
import type { StrategySpec } from "../scenario/schema";
import type { Strategy } from "./strategy";
import { buildCandidateTables, type HybridPlant } from "./dp/tables";
import { BatteryStep } from "./dp/battery-step";
import { EcmsStrategy } from "./ecms";
import { DpManager } from "./dp/manager";
import type { DpRunOptions } from "./dp/solve";

export function isHybrid(plant: Plant): plant is HybridPlant {
  return (plant.powertrain === "parallel" || plant.powertrain === "series") && plant.battery !== null;
}

/** Cost-to-go cells a DP may hold: 32 M doubles = 256 MB (our limit; the 1800 × 201 case needs 2.8 MB). */
export const DP_MAX_CELLS = 32 * 1024 * 1024;

/** Why a DP of this size is refused, or null when it fits. */
export function dpSizeRefusal(steps: number, socPoints: number): string | null {
  const cells = (steps + 1) * (socPoints + 1);
  if (cells <= DP_MAX_CELLS) return null;
  const mb = (cells * 8) / 2 ** 20;
  return `DP over ${steps} steps × ${socPoints} SOC points needs ${mb.toFixed(0)} MB for its cost-to-go (at most ${(DP_MAX_CELLS * 8) / 2 ** 20} MB): reduce strategy.soc_points or the cycle length`;
}

/**
 * ECMS or DP from the Scenario `strategy` block (DESIGN §3), null for other kinds, or a
 * refusal (a reason string) when a DP would not fit in memory.
 */
export function makeOptimisingStrategy(spec: StrategySpec, plant: Plant, opts: DpRunOptions = {}): Strategy | string | null {
  if (!isHybrid(plant)) return null;
  if (spec.kind === "ecms") {
    const tables = buildCandidateTables(plant, spec.control_points);
    return new EcmsStrategy(plant, tables, new BatteryStep(plant.battery, plant.demand.dt_s), {
      equivalenceFactor: spec.equivalence_factor,
      socFeedbackGain: spec.soc_feedback_gain,
      socTarget: spec.soc_target,
    });
  }
  if (spec.kind === "dp") {
    const refusal = dpSizeRefusal(plant.demand.n, spec.soc_points);
    if (refusal) return refusal;
    return new DpManager(plant, {
      socPoints: spec.soc_points,
      controlPoints: spec.control_points,
      socFinalMin: spec.soc_final_min,
      socFinalMax: spec.soc_final_max,
    }, opts);
  }
  return null;
}
