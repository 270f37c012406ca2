import type { ParallelPlant } from "../plants/parallel";
import { MODE_ENGINE_OFF, MODE_ENGINE_ON } from "../plants/plant";
import { msToKmh } from "../units";
import type { Strategy } from "./strategy";

export interface ParallelRuleParams {
  electricSpeedMax_kmh: number;
  socLow: number;
  socHigh: number;
  charge_w: number;
  /** Load-point shifting target as a fraction of full-load torque; undefined: fixed charge power. */
  shiftTorqueFraction?: number;
}

/**
 * Parallel-hybrid fixed rule (documented in docs/engine.md):
 * 1. standstill and braking: engine off, the plant recuperates within the limits;
 * 2. electric drive when the mean speed is ≤ electric_speed_max_kmh, SOC > soc_low, the
 *    motor can carry the shaft torque and the battery can supply it within its limits;
 * 3. otherwise the engine runs; if it cannot carry the demand the motor boosts with the
 *    excess (as far as motor and battery allow); else below soc_high the motor charges
 *    (load-point shift) with charge_power_kw scaled by (soc_high − SOC)/(soc_high − soc_low),
 *    capped at 1: a proportional pull towards the band, within the engine's full-load
 *    headroom and the battery's charge limit; at or above soc_high the engine alone drives.
 *    With `shiftTorqueFraction` (load-point shifting, docs/strategies.md) the charge torque
 *    instead lifts the engine towards that fraction of its full-load torque, where a Willans
 *    engine is most efficient (brake efficiency e·P/(P + P_0) rises with load), times the
 *    same pull, within the motor's torque and the battery's charge limit.
 * Every choice is made inside the limits, so the rule never creates an infeasible step on
 * its own; what the hardware cannot do still shows up as findings.
 */
export class ParallelRuleStrategy implements Strategy {
  readonly kind = "rule";

  constructor(private readonly plant: ParallelPlant, private readonly p: ParallelRuleParams) {}

  reset(): void {}

  decide(k: number, soc: number, ctl: Float64Array): void {
    const plant = this.plant;
    ctl[0] = MODE_ENGINE_OFF;
    ctl[1] = 0;
    if (!plant.inTraction(k)) return;
    const d = plant.demand;
    const b = plant.battery;
    const m = plant.motor;
    const w = d.shaft_rad_s[k];
    const demand = plant.torqueDemand[k];
    const limit = w <= m.max_rad_s ? plant.motorLimit[k] : 0;
    const aux = plant.aux_w;
    const slow = msToKmh(d.speed_m_s[k]) <= this.p.electricSpeedMax_kmh && soc > this.p.socLow && demand <= limit;
    const fullLoad = plant.engineFullLoad[k];
    // The discharge limit costs an OCV lookup: only needed for electric drive or boost.
    const discharge = slow || demand > fullLoad ? b.dischargeLimit_w(soc, d.dt_s) : 0;
    if (slow && m.electrical_w(d.shaft_w[k]) + aux <= discharge) return;
    ctl[0] = MODE_ENGINE_ON;
    let t = 0;
    if (demand > fullLoad) {
      const byBattery = ((discharge - aux) * m.efficiency) / w;
      t = Math.max(0, Math.min(demand - fullLoad, limit, byBattery));
    } else if (soc < this.p.socHigh) {
      const byBattery = ((b.chargeLimit_w(soc, d.dt_s) - aux) / m.efficiency) / w; // ≤ 0
      const pull = Math.min(1, (this.p.socHigh - soc) / Math.max(1e-9, this.p.socHigh - this.p.socLow));
      const shift = this.p.shiftTorqueFraction;
      const wanted = shift === undefined ? (pull * this.p.charge_w) / w : pull * (shift * fullLoad - demand);
      const charge = Math.min(wanted, limit, fullLoad - demand, -byBattery);
      t = charge > 0 ? -charge : 0;
    }
    ctl[1] = t;
  }
}
