import type { Demand } from "../demand";
import type { Run } from "../simulate";

/** Time (s) in each operating region of a hybrid run; the regions partition the cycle. */
export interface OperatingRegions {
  standstill_s: number;
  /** Moving with wheel power ≤ 0: the motor regenerates within its and the battery's limits, the brakes take the rest. */
  regenerating_s: number;
  /** Traction with the engine off. */
  electric_s: number;
  /** Traction, engine on, battery power about zero (parallel: motor idle). */
  engine_only_s: number;
  /** Traction, engine on, the battery helps (parallel: motor motoring; series: pack discharging). */
  engine_assist_s: number;
  /** Traction, engine on, the battery charges (parallel: motor generating; series: pack charging). */
  engine_charging_s: number;
}

/** Below this the motor / pack counts as idle (W): rounding only. */
const IDLE_W = 1;

export function operatingRegions(d: Demand, run: Run, series: boolean): OperatingRegions {
  const r: OperatingRegions = { standstill_s: 0, regenerating_s: 0, electric_s: 0, engine_only_s: 0, engine_assist_s: 0, engine_charging_s: 0 };
  const t = run.traces;
  const dt = d.dt_s;
  for (let k = 0; k < d.n; k++) {
    if (d.moving[k] === 0) r.standstill_s += dt;
    else if (!(d.wheel_w[k] > 0)) r.regenerating_s += dt;
    else if (t.engine_on[k] === 0) r.electric_s += dt;
    else {
      const p = series ? t.battery_power_w[k] : t.motor_power_w[k];
      if (p > IDLE_W) r.engine_assist_s += dt;
      else if (p < -IDLE_W) r.engine_charging_s += dt;
      else r.engine_only_s += dt;
    }
  }
  return r;
}
