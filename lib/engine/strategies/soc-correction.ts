import type { Scenario } from "../scenario/schema";

/**
 * SOC-corrected fuel: the linear battery-energy correction
 *   fuel_corrected = fuel + ΔE_batt / η_eff,
 * with ΔE_batt = battery_net (Σ U_oc·I·dt, J; positive when the pack ends emptier) and a
 * stated effective efficiency from fuel to battery chemical energy. The idea — correct a
 * hybrid's fuel by its net battery energy change over the test — is the one of UNECE R101
 * Annex 8 for hybrids that are not charged from the grid (from memory; R101 itself works
 * with a regression over several test runs, which we do not do).
 * Our η_eff, in order of preference (our choice; no source):
 *  1. 1/s_cs, where s_cs is the ECMS equivalence factor that makes this cycle
 *     charge-sustaining (equivalence.ts): the marginal fuel per joule of battery energy on
 *     this very cycle and powertrain, so the correction prices a small ΔSOC as the optimum
 *     itself does;
 *  2. e · η_machine when no such factor exists: e is the Willans efficiency, the marginal
 *     efficiency of an engine already running (extra shaft power costs ΔP/e fuel), η_machine
 *     the machine that turns it into electrical power (parallel: the motor; series: the
 *     generator).
 */
export interface SocCorrection {
  method: string;
  efficiency: number;
}

export function socCorrection(s: Scenario, chargeSustainingFactor: number | null = null): SocCorrection {
  if (chargeSustainingFactor !== null && chargeSustainingFactor > 0)
    return {
      method: "fuel + battery_net × s_cs (s_cs: ECMS charge-sustaining equivalence factor of this cycle) — linear ΔE correction (R101 Annex 8 idea, from memory)",
      efficiency: 1 / chargeSustainingFactor,
    };
  const e = s.engine?.willans_efficiency ?? 1;
  const machine = s.powertrain === "series" ? (s.generator?.efficiency ?? 1) : (s.motor?.efficiency ?? 1);
  return {
    method: "fuel + battery_net / (willans_efficiency × machine efficiency) — linear ΔE correction (R101 Annex 8 idea, from memory)",
    efficiency: e * machine,
  };
}

export function correctedFuel_j(fuel_j: number, batteryNet_j: number, c: SocCorrection): number {
  return fuel_j + batteryNet_j / c.efficiency;
}
