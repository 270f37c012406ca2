import type { MotorSpec } from "../scenario/schema";
import { W_PER_KW, rpmToRadS } from "../units";

/**
 * Electric machine with constant efficiency (DESIGN §4): electrical = P_m/η motoring,
 * P_m·η generating; |T| ≤ min(T_peak, P_peak/ω) in both directions.
 */
export class ElectricMachine {
  readonly peak_w: number;
  readonly peakTorque_nm: number;
  readonly max_rad_s: number;
  readonly efficiency: number;

  constructor(spec: MotorSpec) {
    this.peak_w = spec.peak_power_kw * W_PER_KW;
    this.peakTorque_nm = spec.peak_torque_nm;
    this.max_rad_s = rpmToRadS(spec.max_speed_rpm);
    this.efficiency = spec.efficiency;
  }

  torqueLimit_nm(speed_rad_s: number): number {
    return speed_rad_s > 0 ? Math.min(this.peakTorque_nm, this.peak_w / speed_rad_s) : this.peakTorque_nm;
  }

  electrical_w(mechanical_w: number): number {
    return mechanical_w >= 0 ? mechanical_w / this.efficiency : mechanical_w * this.efficiency;
  }
}
