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

/** ECMS or DP from the Scenario `strategy` block (DESIGN §3), or null for other kinds. */
export function makeOptimisingStrategy(spec: StrategySpec, plant: Plant, opts: DpRunOptions = {}): Strategy | null {
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
    return new DpManager(plant, {
      socPoints: spec.soc_points,
      controlPoints: spec.control_points,
      socFinalMin: spec.soc_final_min,
      socFinalMax: spec.soc_final_max,
    }, opts);
  }
  return null;
}
