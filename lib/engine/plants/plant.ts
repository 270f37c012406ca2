import type { Demand } from "../demand";
import type { Battery } from "../models/battery";
import type { WillansEngine } from "../models/willans-engine";
import type { Powertrain } from "../scenario/schema";

/** Control modes: the engine off (electric drive / genset off) or on with a control value. */
export const MODE_ENGINE_OFF = 0;
export const MODE_ENGINE_ON = 1;

/**
 * A powertrain on a precomputed demand. `apply` is the one exact step model every strategy
 * uses (simulation, ECMS, DP): scalar, allocation-free, writing into a scratch array laid
 * out in step-output.ts. Control value meaning:
 *   conventional: ignored (the engine carries everything);
 *   bev: ignored;
 *   series: electrical generator power in W (mode on);
 *   parallel: motor torque at the driveline input in N·m (mode on; engine supplies the rest).
 */
export interface Plant {
  readonly powertrain: Powertrain;
  readonly demand: Demand;
  readonly battery: Battery | null;
  readonly engine: WillansEngine | null;
  readonly aux_w: number;
  /** Number of candidate controls of step k (DESIGN §4 candidate sets; 1 when there is no choice). */
  candidateCount(k: number, controlPoints: number): number;
  /** Writes candidate j of step k as ctl[0] = mode, ctl[1] = value. */
  candidate(k: number, j: number, controlPoints: number, ctl: Float64Array): void;
  /**
   * Everything of control (mode, value) at step k except the battery: clears `out`, books
   * fuel, losses and operating points, and returns the battery terminal power the bus needs
   * (W, + discharge; 0 without a battery). Depends on `soc` only on braking steps
   * (regeneration is curtailed by the charge limit), so DP can cache it per (k, candidate)
   * on traction and standstill steps.
   */
  drive(k: number, soc: number, mode: number, value: number, out: Float64Array): number;
  /** drive() followed by the battery step (finishBattery): the full exact step; see step-output.ts. */
  apply(k: number, soc: number, mode: number, value: number, out: Float64Array): void;
}
