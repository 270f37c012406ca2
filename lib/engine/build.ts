import type { Scenario } from "./scenario/schema";
import { buildCustomCycle, buildStandardCycle, type Cycle } from "./cycles";
import { computeDemand, type Demand } from "./demand";
import { Battery } from "./models/battery";
import { ElectricMachine } from "./models/electric-machine";
import { OperatingLine } from "./models/operating-line";
import { WillansEngine } from "./models/willans-engine";
import type { Plant } from "./plants/plant";
import { ConventionalPlant } from "./plants/conventional";
import { BevPlant } from "./plants/bev";
import { SeriesPlant } from "./plants/series";
import { ParallelPlant } from "./plants/parallel";
import { W_PER_KW } from "./units";

export function buildCycle(s: Scenario): Cycle {
  const c = s.cycle;
  if (c.standard !== undefined) return buildStandardCycle(c.standard, c.dt_s ?? 1);
  return buildCustomCycle(c.dt_s!, c.speed_kmh!, c.grade_pct);
}

/**
 * Builds the plant of a validated scenario on a precomputed demand. The parse rules
 * guarantee the blocks each powertrain needs, hence the non-null assertions.
 */
export function buildPlant(s: Scenario, demand: Demand): Plant {
  const aux = s.vehicle.aux_power_w;
  switch (s.powertrain) {
    case "conventional":
      return new ConventionalPlant(demand, new WillansEngine(s.engine!), aux);
    case "bev":
      return new BevPlant(demand, new ElectricMachine(s.motor!), new Battery(s.battery!), aux);
    case "parallel":
      return new ParallelPlant(demand, new WillansEngine(s.engine!), new ElectricMachine(s.motor!), new Battery(s.battery!), aux);
    case "series": {
      const engine = new WillansEngine(s.engine!);
      const line = new OperatingLine(engine.fullLoad, engine.idle_rad_s, engine.max_rad_s);
      const genset = { engine, line, peak_w: s.generator!.peak_power_kw * W_PER_KW, efficiency: s.generator!.efficiency };
      return new SeriesPlant(demand, new ElectricMachine(s.motor!), genset, new Battery(s.battery!), aux);
    }
  }
}

export interface Prepared {
  cycle: Cycle;
  demand: Demand;
  plant: Plant;
}

/** Cycle, demand and plant of a scenario: the once-per-cycle part of an evaluation. */
export function prepare(s: Scenario): Prepared {
  const cycle = buildCycle(s);
  const demand = computeDemand(cycle, s.vehicle, s.driveline);
  return { cycle, demand, plant: buildPlant(s, demand) };
}
