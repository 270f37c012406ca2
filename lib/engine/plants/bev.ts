import type { Demand } from "../demand";
import type { Battery } from "../models/battery";
import type { ElectricMachine } from "../models/electric-machine";
import { S_AUX_W, clearStep } from "../step-output";
import { MODE_ENGINE_OFF, type Plant } from "./plant";
import { bookTractionDriveline, finishBattery, motorDrive, regenerate } from "./common";

/** Battery-electric: motor on the driveline input, auxiliaries on the battery bus. */
export class BevPlant implements Plant {
  readonly powertrain = "bev" as const;
  readonly engine = null;
  private readonly motorLimit: Float64Array;

  constructor(readonly demand: Demand, readonly motor: ElectricMachine, readonly battery: Battery, readonly aux_w: number) {
    this.motorLimit = new Float64Array(demand.n);
    for (let k = 0; k < demand.n; k++) this.motorLimit[k] = motor.torqueLimit_nm(demand.shaft_rad_s[k]);
  }

  candidateCount(): number {
    return 1;
  }

  candidate(_k: number, _j: number, _cp: number, ctl: Float64Array): void {
    ctl[0] = MODE_ENGINE_OFF;
    ctl[1] = 0;
  }

  drive(k: number, soc: number, _mode: number, _value: number, out: Float64Array): number {
    clearStep(out);
    const d = this.demand;
    const aux = this.aux_w;
    out[S_AUX_W] = aux;
    let bus = aux;
    if (d.moving[k] !== 0) {
      if (d.wheel_w[k] > 0) {
        bookTractionDriveline(out, d, k);
        bus += motorDrive(out, this.motor, d.shaft_rad_s[k], d.shaft_w[k], this.motorLimit[k]);
      } else {
        bus += regenerate(out, d, k, this.motor, this.motorLimit[k], this.battery, soc, aux);
      }
    }
    return bus;
  }

  apply(k: number, soc: number, mode: number, value: number, out: Float64Array): void {
    finishBattery(out, this.battery, soc, this.drive(k, soc, mode, value, out), this.demand.dt_s);
  }
}
