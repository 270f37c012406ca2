import type { Run } from "../simulate";
import type { Finding } from "../findings";

/**
 * An energy manager: at step k, from SOC `soc`, choose a control and write it to
 * ctl[0] = mode, ctl[1] = value (see plants/plant.ts). A strategy may keep its own state
 * (e.g. the thermostat's on/off); `reset` is called once before a run. Strategies that pick
 * from the DESIGN §4 candidate set call plant.candidate(k, j, cp, ctl) and plant.apply to
 * score candidates with the exact model.
 */
export interface Strategy {
  readonly kind: string;
  reset(socInitial: number): void;
  decide(k: number, soc: number, ctl: Float64Array): void;
  /** Findings about the strategy itself after a run (e.g. DP: terminal window missed, grid too coarse). */
  findings?(run: Run): Finding[];
}
