import type { EngineSpec } from "../scenario/schema";
import { M3_PER_L, PA_PER_BAR, rpmToRadS } from "../units";
import { FullLoadCurve } from "./full-load-curve";

/**
 * Willans-line engine (DESIGN §4): p_me = e·p_mf − p_me0 with constant e and p_me0.
 * Friction power P_0(ω) = p_me0·V_d·ω/(4π) (four-stroke); fuel power for shaft power P_e
 * is (P_e + P_0)/e. Fuel cut-off is decided by the caller (it depends on motion).
 */
export class WillansEngine {
  readonly efficiency: number;
  /** P_0 per unit speed, W/(rad/s) = N·m: p_me0·V_d/(4π). */
  readonly frictionTorque_nm: number;
  readonly idle_rad_s: number;
  readonly max_rad_s: number;
  readonly lhv_j_per_g: number;
  readonly density_kg_l: number;
  readonly co2_kg_l: number;
  readonly fullLoad: FullLoadCurve;

  constructor(spec: EngineSpec) {
    this.efficiency = spec.willans_efficiency;
    this.frictionTorque_nm = (spec.friction_mep_bar * PA_PER_BAR * spec.displacement_l * M3_PER_L) / (4 * Math.PI);
    this.idle_rad_s = rpmToRadS(spec.idle_speed_rpm);
    this.max_rad_s = rpmToRadS(spec.max_speed_rpm);
    this.lhv_j_per_g = spec.fuel.lhv_mj_kg * 1e3; // MJ/kg = kJ/g
    this.density_kg_l = spec.fuel.density_kg_l;
    this.co2_kg_l = spec.fuel.co2_kg_l;
    this.fullLoad = new FullLoadCurve(spec.max_torque_nm.speed_rpm, spec.max_torque_nm.torque_nm);
  }

  frictionPower_w(speed_rad_s: number): number {
    return this.frictionTorque_nm * speed_rad_s;
  }

  fuelPower_w(shaft_w: number, speed_rad_s: number): number {
    return (shaft_w + this.frictionTorque_nm * speed_rad_s) / this.efficiency;
  }
}
