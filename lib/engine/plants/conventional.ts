import type { Demand } from "../demand";
import type { WillansEngine } from "../models/willans-engine";
import { S_AUX_W, S_BRAKES_W, S_CLUTCH_W, clearStep } from "../step-output";
import { f64Views } from "../buffers";
import { MODE_ENGINE_ON, type Plant } from "./plant";
import { bookBraking, bookTractionDriveline, noBattery, runEngine } from "./common";

/**
 * Conventional powertrain (DESIGN §4). The auxiliaries are a mechanical load on the engine
 * shaft. Traction below idle speed slips the clutch (engine at idle, clutch loss
 * T·(ω_idle − ω)). Braking at or above idle speed feeds the auxiliaries through the
 * driveline first and cuts fuel when that covers them; below idle the clutch is open, the
 * engine idles for the auxiliaries and the brakes take everything. Standstill: idle.
 */
export class ConventionalPlant implements Plant {
  readonly powertrain = "conventional" as const;
  readonly battery = null;
  /** Engine speed of each step (shaft speed, or idle when slipping / idling). */
  private readonly engineSpeed: Float64Array;
  /** Full-load torque at that speed. */
  private readonly fullLoad: Float64Array;

  constructor(readonly demand: Demand, readonly engine: WillansEngine, readonly aux_w: number) {
    const n = demand.n;
    [this.engineSpeed, this.fullLoad] = f64Views(n, 2);
    for (let k = 0; k < n; k++) {
      const w = Math.max(demand.shaft_rad_s[k], engine.idle_rad_s);
      this.engineSpeed[k] = w;
      this.fullLoad[k] = engine.fullLoad.torqueAt(w);
    }
  }

  candidateCount(): number {
    return 1;
  }

  candidate(_k: number, _j: number, _cp: number, ctl: Float64Array): void {
    ctl[0] = MODE_ENGINE_ON;
    ctl[1] = 0;
  }

  drive(k: number, _soc: number, _mode: number, _value: number, out: Float64Array): number {
    clearStep(out);
    const d = this.demand;
    const e = this.engine;
    const aux = this.aux_w;
    out[S_AUX_W] = aux;
    const idle = e.idle_rad_s;
    if (d.moving[k] === 0) {
      runEngine(out, e, idle, aux, this.fullLoad[k], false);
      return 0;
    }
    const shaft = d.shaft_rad_s[k];
    const pw = d.wheel_w[k];
    if (pw > 0) {
      bookTractionDriveline(out, d, k);
      const pin = d.shaft_w[k];
      if (shaft >= idle) {
        runEngine(out, e, shaft, pin + aux, this.fullLoad[k], true);
      } else {
        const clutchTorque = pin / shaft;
        out[S_CLUTCH_W] = clutchTorque * (idle - shaft);
        runEngine(out, e, idle, clutchTorque * idle + aux, this.fullLoad[k], true);
      }
      return 0;
    }
    if (shaft >= idle) {
      const fromWheels = Math.min(aux, -d.shaft_w[k]);
      bookBraking(out, d, k, -fromWheels);
      runEngine(out, e, shaft, aux - fromWheels, this.fullLoad[k], true);
    } else {
      out[S_BRAKES_W] = -pw;
      runEngine(out, e, idle, aux, this.fullLoad[k], false);
    }
    return 0;
  }

  /** No traction battery: SOC is carried through unchanged. */
  apply(k: number, soc: number, mode: number, value: number, out: Float64Array): void {
    this.drive(k, soc, mode, value, out);
    noBattery(out, soc);
  }

  /** Engine speed of step k (for strategies and traces). */
  engineSpeedAt(k: number): number {
    return this.engineSpeed[k];
  }
}
