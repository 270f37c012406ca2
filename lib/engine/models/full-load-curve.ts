import { rpmToRadS } from "../units";

/**
 * Piecewise-linear full-load torque over engine speed. Outside the breakpoints the end
 * values hold (the scenario rules make the breakpoints span idle..max speed, so holding only
 * matters on steps that are already reported as over-speed).
 */
export class FullLoadCurve {
  readonly speed_rad_s: Float64Array;
  readonly torque_nm: Float64Array;

  constructor(speed_rpm: readonly number[], torque_nm: readonly number[]) {
    this.speed_rad_s = Float64Array.from(speed_rpm, rpmToRadS);
    this.torque_nm = Float64Array.from(torque_nm);
  }

  torqueAt(speed_rad_s: number): number {
    const x = this.speed_rad_s;
    const y = this.torque_nm;
    const last = x.length - 1;
    if (speed_rad_s <= x[0]) return y[0];
    if (speed_rad_s >= x[last]) return y[last];
    let i = 1;
    while (x[i] < speed_rad_s) i++;
    const u = (speed_rad_s - x[i - 1]) / (x[i] - x[i - 1]);
    return y[i - 1] + u * (y[i] - y[i - 1]);
  }
}
