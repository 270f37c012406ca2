import type { Demand } from "./demand";
import type { Ledger } from "./ledger";
import type { ScenarioError } from "./scenario/errors";
import { msToKmh } from "./units";

/**
 * Guards against magnitudes beyond double precision (e.g. a speed of 1e200 km/h, a mass of
 * 1e308 kg, a 10 km/h jump within 1e-306 s): each field is a valid positive number, but the
 * road load overflows and Inf − Inf would put NaN in the Result. Such a scenario gets an
 * error naming the step and its figures instead.
 */
function error(path: string, value: unknown, rule: string): ScenarioError {
  return { path, value, rule, message: `${path}: ${rule}` };
}

/** The first step whose road load is not a finite number, as an error; null when all are. */
export function demandOverflow(d: Demand): ScenarioError | null {
  for (let k = 0; k < d.n; k++) {
    if (Number.isFinite(d.wheel_w[k]) && Number.isFinite(d.shaft_w[k]) && Number.isFinite(d.shaft_rad_s[k])) continue;
    const rule =
      `the road load overflows double precision at t = ${d.time_s[k]} s (mean speed ${msToKmh(d.speed_m_s[k])} km/h, ` +
      `acceleration ${d.accel_m_s2[k]} m/s²); check the speed units, dt_s and the vehicle figures`;
    return error("cycle", msToKmh(d.speed_m_s[k]), rule);
  }
  return null;
}

/** A ledger term that is not a finite number (an engine or battery figure far out of range), as an error. */
export function ledgerOverflow(l: Ledger): ScenarioError | null {
  for (const [key, value] of Object.entries(l)) {
    if (Number.isFinite(value)) continue;
    return error("(scenario)", value, `the ledger term '${key}' overflows double precision; check the engine, motor and battery figures`);
  }
  return null;
}
