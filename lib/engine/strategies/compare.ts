import type { Scenario } from "../scenario/schema";
import type { Finding } from "../findings";
import { prepare } from "../build";
import { simulate, type Run } from "../simulate";
import { SeriesPlant } from "../plants/series";
import { ParallelPlant } from "../plants/parallel";
import { W_PER_KW } from "../units";
import type { Strategy } from "./strategy";
import { ThermostatStrategy } from "./thermostat";
import { ParallelRuleStrategy } from "./parallel-rule";
import { buildCandidateTables, type HybridPlant } from "./dp/tables";
import { chargeSustainingFactor } from "./equivalence";
import { DpManager } from "./dp/manager";
import { dpSizeRefusal, isHybrid } from "./optimising";
import { operatingRegions, type OperatingRegions } from "./regions";
import { correctedFuel_j, socCorrection, type SocCorrection } from "./soc-correction";

export const COMPARISON_FORMAT_V1 = "joulebook.comparison/1";

export interface StrategyFigures {
  kind: "rule" | "thermostat" | "ecms" | "dp";
  label: string;
  fuel_g: number;
  fuel_corrected_g: number;
  /** (corrected fuel − DP corrected fuel) / DP corrected fuel, %. 0 for DP itself. */
  gap_to_dp_pct: number;
  soc_final: number;
  delta_soc: number;
  battery_net_kwh: number;
  electric_drive_s: number;
  engine_starts: number;
  regions_s: OperatingRegions;
  feasible: boolean;
  infeasible_steps: number;
  /** SOC at the start of each step (for the chart). */
  soc: number[];
}

export interface Comparison {
  format: typeof COMPARISON_FORMAT_V1;
  name: string;
  powertrain: "parallel" | "series";
  duration_s: number;
  distance_km: number;
  correction: SocCorrection;
  ecms: { equivalence_factor: number; soc_feedback_gain: number; charge_sustaining: boolean; bisection_runs: number };
  dp: { soc_points: number; control_points: number; soc_final_min: number; soc_final_max: number };
  strategies: StrategyFigures[];
  findings: Finding[];
}

export interface CompareOptions {
  signal?: AbortSignal;
  /** Overall share done (0..1) and the phase running. */
  onProgress?: (share: number, phase: string) => void;
  /** Run the DP grid-sensitivity pass (default true). */
  gridCheck?: boolean;
}

export type CompareOutcome = { ok: true; comparison: Comparison } | { ok: false; reason: string };

const DEFAULT_CP = 41;
const DEFAULT_SOC_POINTS = 201;
/**
 * DP window when the scenario does not give one: from the initial SOC up to 0.05 % SOC above
 * it. DP uses any slack in the window to save fuel, and on a short cycle ±0.1 % SOC is worth
 * a few percent of the fuel, which the linear correction cannot price exactly; so the window
 * starts at the initial SOC (charge-sustaining or better).
 */
const DEFAULT_WINDOW = 0.0005;
/** ECMS bisection tolerance on the final SOC for the comparison. */
const ECMS_TOLERANCE_SOC = 2e-4;

/** Parallel rule for the comparison when the scenario has none (docs/strategies.md). */
const DEFAULT_RULE = { electric_speed_max_kmh: 50, charge_power_kw: 1, soc_low: undefined, soc_high: undefined, shift_torque_fraction: 0.8 };

/** Baseline causal strategy: the scenario's own rule / thermostat, else documented defaults (docs/strategies.md). */
function baseline(s: Scenario, plant: HybridPlant): Strategy {
  const b = s.battery!;
  const st = s.strategy;
  const span = b.soc_max - b.soc_min;
  if (plant instanceof SeriesPlant) {
    if (st?.kind === "thermostat") return new ThermostatStrategy(plant, st.soc_on, st.soc_off, st.on_power_kw * W_PER_KW);
    const on = Math.max(b.soc_min, b.soc_initial - 0.05 * span);
    const off = Math.min(b.soc_max, b.soc_initial + 0.05 * span);
    return new ThermostatStrategy(plant, on, off, 0.5 * s.generator!.peak_power_kw * W_PER_KW);
  }
  const rule = st?.kind === "rule" ? st : DEFAULT_RULE;
  return new ParallelRuleStrategy(plant as ParallelPlant, {
    electricSpeedMax_kmh: rule.electric_speed_max_kmh,
    socLow: rule.soc_low ?? b.soc_min + 0.3 * span,
    socHigh: rule.soc_high ?? b.soc_min + 0.7 * span,
    charge_w: rule.charge_power_kw * W_PER_KW,
    shiftTorqueFraction: rule.shift_torque_fraction,
  });
}

/** Rule (parallel) or thermostat (series) vs ECMS (charge-sustaining factor by bisection) vs DP on one scenario. */
export function compareStrategies(s: Scenario, o: CompareOptions = {}): CompareOutcome {
  const { demand, plant } = prepare(s);
  if (!isHybrid(plant)) return { ok: false, reason: `strategy comparison needs a parallel or series hybrid, not '${s.powertrain}'` };
  const b = s.battery!;
  const st = s.strategy;
  const progress = (share: number, phase: string) => o.onProgress?.(share, phase);
  const check = () => { if (o.signal?.aborted) throw o.signal.reason ?? new Error("aborted"); };
  const cp = st?.kind === "ecms" || st?.kind === "dp" ? st.control_points : DEFAULT_CP;
  const dpSettings = st?.kind === "dp"
    ? { socPoints: st.soc_points, controlPoints: cp, socFinalMin: st.soc_final_min, socFinalMax: st.soc_final_max }
    : { socPoints: DEFAULT_SOC_POINTS, controlPoints: cp, socFinalMin: b.soc_initial, socFinalMax: Math.min(b.soc_max, b.soc_initial + DEFAULT_WINDOW) };
  const tooBig = dpSizeRefusal(demand.n, dpSettings.socPoints);
  if (tooBig) return { ok: false, reason: tooBig };
  progress(0, "baseline");
  const base = baseline(s, plant);
  const baseRun = simulate(plant, base, b.soc_initial);
  check();
  progress(0.03, "candidate tables");
  const tables = buildCandidateTables(plant, cp);
  progress(0.06, "ECMS factor");
  const gain = st?.kind === "ecms" ? st.soc_feedback_gain : 0;
  const cs = chargeSustainingFactor(plant, tables, { gain, socTarget: b.soc_initial, toleranceSoc: ECMS_TOLERANCE_SOC, signal: o.signal });
  const ecmsRun = cs.run;
  check();
  progress(0.2, "DP backward pass");
  const dp = new DpManager(plant, dpSettings, {
    tables, signal: o.signal, gridCheck: o.gridCheck,
    onProgress: (x) => progress(0.2 + 0.78 * x, x <= 2 / 3 || o.gridCheck === false ? "DP backward pass" : "DP grid check"),
  });
  const dpRun = simulate(plant, dp, b.soc_initial);
  const dpFindings = dp.findings(dpRun);
  progress(1, "done");
  const corr = socCorrection(s, cs.bracketed ? cs.factor : null);
  const lhv = s.engine!.fuel.lhv_mj_kg * 1e3;
  const dpCorr = correctedFuel_j(dpRun.ledger.fuel, dpRun.ledger.battery_net, corr);
  const series = s.powertrain === "series";
  const figures = (kind: StrategyFigures["kind"], label: string, run: Run): StrategyFigures => {
    const c = correctedFuel_j(run.ledger.fuel, run.ledger.battery_net, corr);
    const regions = operatingRegions(demand, run, series);
    return {
      kind, label, fuel_g: run.ledger.fuel / lhv, fuel_corrected_g: c / lhv,
      gap_to_dp_pct: dpCorr > 0 ? ((c - dpCorr) / dpCorr) * 100 : 0,
      soc_final: run.socFinal, delta_soc: run.socFinal - b.soc_initial, battery_net_kwh: run.ledger.battery_net / 3.6e6,
      electric_drive_s: regions.electric_s, engine_starts: run.engineStarts, regions_s: regions,
      feasible: run.tracker.infeasibleSteps === 0, infeasible_steps: run.tracker.infeasibleSteps, soc: run.traces.soc,
    };
  };
  const findings: Finding[] = [...dpFindings];
  if (!cs.bracketed) {
    findings.push({
      severity: "warning", code: "ecms_not_charge_sustaining", component: "strategy", time_start_s: null, time_end_s: null, steps: 0, worst: null,
      message: `ECMS: no equivalence factor makes this cycle charge-sustaining; the closest (${cs.factor.toFixed(3)}) ends with ΔSOC ${cs.deltaSoc.toFixed(4)}; compare the SOC-corrected fuel.`,
    });
  }
  return {
    ok: true,
    comparison: {
      format: COMPARISON_FORMAT_V1, name: s.name, powertrain: series ? "series" : "parallel",
      duration_s: demand.n * demand.dt_s, distance_km: demand.distance_m / 1000, correction: corr,
      ecms: { equivalence_factor: cs.factor, soc_feedback_gain: gain, charge_sustaining: cs.bracketed, bisection_runs: cs.iterations },
      dp: { soc_points: dpSettings.socPoints, control_points: cp, soc_final_min: dpSettings.socFinalMin, soc_final_max: dpSettings.socFinalMax },
      strategies: [
        figures(series ? "thermostat" : "rule", series ? "Thermostat" : "Rule-based", baseRun),
        figures("ecms", "ECMS", ecmsRun),
        figures("dp", "DP (lower bound)", dpRun),
      ],
      findings,
    },
  };
}
