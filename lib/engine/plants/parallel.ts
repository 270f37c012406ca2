import type { Demand } from "../demand";
import type { Battery } from "../models/battery";
import type { ElectricMachine } from "../models/electric-machine";
import type { WillansEngine } from "../models/willans-engine";
import { S_AUX_W, S_CLUTCH_W, V_MOTOR_SPEED, V_MOTOR_TORQUE, clearStep, violate } from "../step-output";
import { f64Views } from "../buffers";
import { MODE_ENGINE_OFF, MODE_ENGINE_ON, type Plant } from "./plant";
import { bookTractionDriveline, finishBattery, motorAt, motorDrive, regenerate, runEngine } from "./common";

/**
 * Parallel hybrid: engine and motor on the driveline input shaft (same speed when the
 * engine clutch is closed; below idle speed the engine clutch slips with the engine at
 * idle). Auxiliaries are electric. At standstill and while braking the engine is off and
 * the motor recuperates as in the battery-electric case. In traction the control is
 * either electric drive (mode off) or a motor torque (mode on, N·m, + motoring) with the
 * engine supplying the remainder of the shaft torque demand.
 */
export class ParallelPlant implements Plant {
  readonly powertrain = "parallel" as const;
  readonly motorLimit: Float64Array;
  /** Engine speed if it runs at step k: shaft speed, or idle while slipping. */
  readonly engineSpeed: Float64Array;
  readonly engineFullLoad: Float64Array;
  /** Shaft torque demand in traction (N·m); 0 when not in traction. */
  readonly torqueDemand: Float64Array;

  constructor(readonly demand: Demand, readonly engine: WillansEngine, readonly motor: ElectricMachine, readonly battery: Battery, readonly aux_w: number) {
    const n = demand.n;
    [this.motorLimit, this.engineSpeed, this.engineFullLoad, this.torqueDemand] = f64Views(n, 4);
    for (let k = 0; k < n; k++) {
      const w = demand.shaft_rad_s[k];
      this.motorLimit[k] = motor.torqueLimit_nm(w);
      const we = Math.max(w, engine.idle_rad_s);
      this.engineSpeed[k] = we;
      this.engineFullLoad[k] = engine.fullLoad.torqueAt(we);
      if (this.inTraction(k)) this.torqueDemand[k] = demand.shaft_w[k] / w;
    }
  }

  inTraction(k: number): boolean {
    return this.demand.moving[k] !== 0 && this.demand.wheel_w[k] > 0;
  }

  /**
   * Candidates (DESIGN §4): in traction, j = 0 is electric drive (not eligible when the
   * motor cannot carry the demand — see the violation mask) and j = 1..cp are motor torques
   * evenly spaced from full generating torque to min(demand, full motoring torque).
   * Standstill and braking have the single candidate "engine off".
   */
  candidateCount(k: number, controlPoints: number): number {
    return this.inTraction(k) ? controlPoints + 1 : 1;
  }

  candidate(k: number, j: number, controlPoints: number, ctl: Float64Array): void {
    if (j === 0 || !this.inTraction(k)) {
      ctl[0] = MODE_ENGINE_OFF;
      ctl[1] = 0;
      return;
    }
    const limit = this.motorLimit[k];
    const lo = -limit;
    const hi = Math.min(this.torqueDemand[k], limit);
    ctl[0] = MODE_ENGINE_ON;
    ctl[1] = controlPoints > 1 ? lo + ((j - 1) * (hi - lo)) / (controlPoints - 1) : lo;
  }

  drive(k: number, soc: number, mode: number, value: number, out: Float64Array): number {
    clearStep(out);
    const d = this.demand;
    const aux = this.aux_w;
    out[S_AUX_W] = aux;
    let bus = aux;
    if (d.moving[k] !== 0) {
      if (d.wheel_w[k] > 0) {
        bookTractionDriveline(out, d, k);
        bus += mode === MODE_ENGINE_ON ? this.hybridDrive(k, value, out) : motorDrive(out, this.motor, d.shaft_rad_s[k], d.shaft_w[k], this.motorLimit[k]);
      } else {
        bus += regenerate(out, d, k, this.motor, this.motorLimit[k], this.battery, soc, aux);
      }
    }
    return bus;
  }

  apply(k: number, soc: number, mode: number, value: number, out: Float64Array): void {
    finishBattery(out, this.battery, soc, this.drive(k, soc, mode, value, out), this.demand.dt_s);
  }

  /**
   * Engine on with motor torque `torque` (N·m at the shaft). The motor never drives the
   * engine: a torque above the demand is reduced to the demand. A torque outside the motor
   * limit is infeasible, clamped, and the engine takes the remainder. Returns the motor's
   * electrical power.
   */
  private hybridDrive(k: number, torque: number, out: Float64Array): number {
    const w = this.demand.shaft_rad_s[k];
    const demand = this.torqueDemand[k];
    const limit = this.motorLimit[k];
    let t = torque < demand ? torque : demand;
    if (t > limit * (1 + 1e-12)) {
      violate(out, V_MOTOR_TORQUE, t, limit);
      t = limit;
    } else if (t < -limit * (1 + 1e-12)) {
      violate(out, V_MOTOR_TORQUE, -t, limit);
      t = -limit;
    }
    if (t !== 0 && w > this.motor.max_rad_s * (1 + 1e-12)) violate(out, V_MOTOR_SPEED, w, this.motor.max_rad_s);
    const elec = motorAt(out, this.motor, w, t * w);
    const clutchTorque = demand - t;
    const we = this.engineSpeed[k];
    if (we > w) out[S_CLUTCH_W] = clutchTorque * (we - w);
    runEngine(out, this.engine, we, clutchTorque * we, this.engineFullLoad[k], true);
    return elec;
  }
}
