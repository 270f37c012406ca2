import { prepare } from "@/lib/engine/build";
import type { Scenario } from "@/lib/engine/scenario/schema";
import { S_FUEL_W, S_SOC_NEXT, S_VIOLATIONS, newStepScratch } from "@/lib/engine/step-output";
import type { HybridPlant } from "@/lib/engine/strategies/dp/tables";
import { isHybrid } from "@/lib/engine/strategies/optimising";
import { example, parsed } from "../helpers";

/** A 6-step hybrid scenario with a 1 Ah pack, so that one step moves SOC by a few percent. */
export function tinyScenario(powertrain: "series" | "parallel", speed_kmh: number[], window: [number, number], controlPoints: number, dt_s = 1): Scenario {
  const raw = example(powertrain);
  raw.cycle = { dt_s, speed_kmh };
  raw.battery = { ...raw.battery, capacity_ah: 1, soc_initial: 0.5, soc_min: 0.3, soc_max: 0.8, max_discharge_c: 150, max_charge_c: 40 };
  raw.strategy = { kind: "dp", soc_points: 201, control_points: controlPoints, soc_final_min: window[0], soc_final_max: window[1] };
  return parsed(raw);
}

export function tinyPlant(s: Scenario): HybridPlant {
  const { plant } = prepare(s);
  if (!isHybrid(plant)) throw new Error("not a hybrid");
  return plant;
}

export interface Enumeration {
  /** Least fuel (J) over sequences that break no limit and end in the window; Infinity if none. */
  bestFuel_j: number;
  feasibleCount: number;
  /** Highest final SOC over sequences that break no limit (window ignored). */
  maxFinalSoc: number;
}

/** Every control sequence of the candidate sets, each simulated with the exact step model. */
export function enumerate(plant: HybridPlant, controlPoints: number, window: [number, number]): Enumeration {
  const n = plant.demand.n;
  const out = newStepScratch();
  const ctl = new Float64Array(2);
  const counts = Array.from({ length: n }, (_, k) => plant.candidateCount(k, controlPoints));
  const r: Enumeration = { bestFuel_j: Infinity, feasibleCount: 0, maxFinalSoc: -Infinity };
  const walk = (k: number, soc: number, fuel: number): void => {
    if (k === n) {
      if (soc > r.maxFinalSoc) r.maxFinalSoc = soc;
      if (soc >= window[0] - 1e-12 && soc <= window[1] + 1e-12) {
        r.feasibleCount++;
        if (fuel < r.bestFuel_j) r.bestFuel_j = fuel;
      }
      return;
    }
    for (let j = 0; j < counts[k]; j++) {
      plant.candidate(k, j, controlPoints, ctl);
      plant.apply(k, soc, ctl[0], ctl[1], out);
      if (out[S_VIOLATIONS] !== 0) continue;
      walk(k + 1, out[S_SOC_NEXT], fuel + out[S_FUEL_W] * plant.demand.dt_s);
    }
  };
  walk(0, plant.battery.socInitial, 0);
  return r;
}
