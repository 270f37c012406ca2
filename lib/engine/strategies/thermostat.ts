import type { SeriesPlant } from "../plants/series";
import { MODE_ENGINE_OFF, MODE_ENGINE_ON } from "../plants/plant";
import type { Strategy } from "./strategy";

/**
 * Series-hybrid thermostat (DESIGN §4): the engine turns on at SOC ≤ soc_on and off at
 * SOC ≥ soc_off, keeps its last state in between, starts off unless SOC starts ≤ soc_on,
 * and when on delivers a fixed electrical power, also at standstill.
 * Our addition: when the battery cannot absorb the surplus (charge-current limit or
 * soc_max within the step), the power is reduced to what the bus can take, and the engine
 * pauses for that step if nothing can be taken; so the thermostat never breaks a charge limit.
 */
export class ThermostatStrategy implements Strategy {
  readonly kind = "thermostat";
  private on = false;

  constructor(private readonly plant: SeriesPlant, private readonly socOn: number, private readonly socOff: number, private readonly power_w: number) {}

  reset(socInitial: number): void {
    this.on = socInitial <= this.socOn;
  }

  decide(k: number, soc: number, ctl: Float64Array): void {
    if (soc <= this.socOn) this.on = true;
    else if (soc >= this.socOff) this.on = false;
    if (!this.on) {
      ctl[0] = MODE_ENGINE_OFF;
      ctl[1] = 0;
      return;
    }
    const p = this.plant;
    const absorbable = p.loadBus_w[k] - p.battery.chargeLimit_w(soc, p.demand.dt_s);
    const power = Math.min(this.power_w, absorbable);
    ctl[0] = power > 0 ? MODE_ENGINE_ON : MODE_ENGINE_OFF;
    ctl[1] = power > 0 ? power : 0;
  }
}
