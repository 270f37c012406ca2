import type { Demand } from "../demand";
import type { Battery } from "../models/battery";
import type { ElectricMachine } from "../models/electric-machine";
import type { WillansEngine } from "../models/willans-engine";
import { S_AUX_W, clearStep } from "../step-output";
import { f64Views } from "../buffers";
import { MODE_ENGINE_OFF, MODE_ENGINE_ON, type Plant } from "./plant";
import { bookTractionDriveline, finishBattery, motorDrive, regenerate } from "./common";
import { runGenset, type GensetParams } from "./genset";

/**
 * Series hybrid: the motor drives the wheels through the driveline; the engine–generator
 * set feeds the bus (control value = electrical generator power, W); the battery covers
 * the rest. While braking, regeneration counts the generator output and the auxiliaries
 * on the bus before the charge limit (DESIGN §4).
 */
export class SeriesPlant implements Plant {
  readonly powertrain = "series" as const;
  readonly engine: WillansEngine;
  private readonly motorLimit: Float64Array;
  /** Bus load of each step before the genset: motor electrical power in traction (clamped to its limits) + auxiliaries. */
  readonly loadBus_w: Float64Array;

  constructor(readonly demand: Demand, readonly motor: ElectricMachine, readonly genset: GensetParams, readonly battery: Battery, readonly aux_w: number) {
    this.engine = genset.engine;
    const n = demand.n;
    [this.motorLimit, this.loadBus_w] = f64Views(n, 2);
    for (let k = 0; k < n; k++) {
      const w = demand.shaft_rad_s[k];
      const limit = motor.torqueLimit_nm(w);
      this.motorLimit[k] = limit;
      const traction = demand.moving[k] !== 0 && demand.wheel_w[k] > 0 ? Math.min(demand.shaft_w[k], limit * w) : 0;
      this.loadBus_w[k] = motor.electrical_w(traction) + aux_w;
    }
  }

  /** Candidates (DESIGN §4): engine off, then control_points − 1 powers from peak/(cp − 1) to the peak. */
  candidateCount(_k: number, controlPoints: number): number {
    return controlPoints;
  }

  candidate(_k: number, j: number, controlPoints: number, ctl: Float64Array): void {
    if (j === 0) {
      ctl[0] = MODE_ENGINE_OFF;
      ctl[1] = 0;
    } else {
      ctl[0] = MODE_ENGINE_ON;
      ctl[1] = (this.genset.peak_w * j) / (controlPoints - 1);
    }
  }

  drive(k: number, soc: number, mode: number, value: number, out: Float64Array): number {
    clearStep(out);
    const d = this.demand;
    const aux = this.aux_w;
    out[S_AUX_W] = aux;
    const gen = mode === MODE_ENGINE_ON && value > 0 ? runGenset(out, this.genset, value) : 0;
    let bus = aux - gen;
    if (d.moving[k] !== 0) {
      if (d.wheel_w[k] > 0) {
        bookTractionDriveline(out, d, k);
        bus += motorDrive(out, this.motor, d.shaft_rad_s[k], d.shaft_w[k], this.motorLimit[k]);
      } else {
        bus += regenerate(out, d, k, this.motor, this.motorLimit[k], this.battery, soc, bus);
      }
    }
    return bus;
  }

  apply(k: number, soc: number, mode: number, value: number, out: Float64Array): void {
    finishBattery(out, this.battery, soc, this.drive(k, soc, mode, value, out), this.demand.dt_s);
  }
}
