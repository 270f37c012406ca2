import type { Scenario } from "./scenario/schema";
import type { CycleStats } from "./cycles/stats";
import type { Finding } from "./findings";
import type { Ledger } from "./ledger";

export const RESULT_FORMAT_V1 = "joulebook.result/1";

export interface Kpi {
  distance_km: number;
  duration_s: number;
  fuel_g: number;
  fuel_l: number;
  /** null when the cycle covers no distance. */
  fuel_l_per_100km: number | null;
  co2_g_per_km: number | null;
  battery_net_kwh: number;
  electric_kwh_per_100km: number | null;
  /** null for the conventional powertrain (no traction battery). */
  soc_initial: number | null;
  soc_final: number | null;
  feasible: boolean;
  infeasible_steps: number;
  engine_starts: number;
  max_c_rate: number | null;
}

/** Per-step series (length N, one value per interval; time_s is the interval start). */
export interface Traces {
  time_s: number[];
  speed_kmh: number[]; // mean speed of the interval
  gear: number[]; // 0 at standstill
  wheel_power_w: number[];
  brake_power_w: number[];
  engine_on: number[];
  engine_power_w: number[];
  engine_speed_rpm: number[];
  engine_torque_nm: number[];
  motor_power_w: number[];
  motor_torque_nm: number[];
  generator_power_w: number[];
  battery_power_w: number[];
  battery_current_a: number[];
  soc: number[]; // at the interval start; kpi.soc_final is the end value
  fuel_rate_g_s: number[];
}

export interface Result {
  format: typeof RESULT_FORMAT_V1;
  name: string;
  powertrain: Scenario["powertrain"];
  strategy: string | null;
  kpi: Kpi;
  ledger_j: Ledger;
  /** (fuel + battery_net + unmet_demand) − Σ sinks, J. */
  closure_error_j: number;
  /** Largest single-step closure error, W. */
  closure_error_max_step_w: number;
  findings: Finding[];
  /** Per-step ledger as powers (W; × dt = J per step), only with `{ stepLedger: true }`. */
  step_ledger_w?: Record<keyof Ledger, number[]>;
  cycle: CycleStats & { dt_s: number; steps: number };
  traces: Traces;
  curves: {
    engine_full_load: { speed_rpm: number[]; torque_nm: number[] } | null;
    engine_max_speed_rpm: number | null;
    engine_idle_speed_rpm: number | null;
  };
}
