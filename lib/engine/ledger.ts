/**
 * Loss ledger (DESIGN §4), joules over the cycle:
 *   fuel + battery_net (+ unmet_demand) = aero + rolling + grade + kinetic + friction_brakes
 *     + driveline + clutch + engine + motor + generator + battery_internal + auxiliaries
 * battery_net = Σ U_oc·I·dt (negative when the pack ends fuller). unmet_demand is our
 * addition: the energy the hardware could not supply on infeasible steps (clamped to what
 * was available); it is exactly 0 whenever the result is feasible.
 */
export const SUPPLY_KEYS = ["fuel", "battery_net", "unmet_demand"] as const;
export const SINK_KEYS = [
  "aero", "rolling", "grade", "kinetic", "friction_brakes", "driveline", "clutch",
  "engine", "motor", "generator", "battery_internal", "auxiliaries",
] as const;
export type LedgerKey = (typeof SUPPLY_KEYS)[number] | (typeof SINK_KEYS)[number];
export type Ledger = Record<LedgerKey, number>;

export function closureError_j(l: Ledger): number {
  let supply = 0;
  for (const key of SUPPLY_KEYS) supply += l[key];
  let sinks = 0;
  for (const key of SINK_KEYS) sinks += l[key];
  return supply - sinks;
}

/** Sum of magnitudes of all terms: the scale for a relative closure error. */
export function ledgerScale_j(l: Ledger): number {
  let total = 0;
  for (const key of [...SUPPLY_KEYS, ...SINK_KEYS]) total += Math.abs(l[key]);
  return total;
}
