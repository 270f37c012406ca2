import type { Finding } from "../../findings";
import type { Demand } from "../../demand";
import type { DpPlan } from "./solve";

const fmt = (x: number, d = 4) => x.toFixed(d);

function finding(severity: Finding["severity"], code: string, message: string, t0: number | null = null, t1: number | null = null, steps = 0): Finding {
  return { severity, code, component: "strategy", message, time_start_s: t0, time_end_s: t1, steps, worst: null };
}

/**
 * What the DP must say instead of failing silently: the terminal window cannot be met
 * (and by how much the plan misses it), or the forward pass left the feasible set.
 */
export function dpWindowFindings(plan: DpPlan, d: Demand, socInitial: number, socFinal: number): Finding[] {
  const out: Finding[] = [];
  const { socFinalMin: wMin, socFinalMax: wMax } = plan.settings;
  const miss = socFinal < wMin ? wMin - socFinal : socFinal > wMax ? socFinal - wMax : 0;
  const window = `${fmt(wMin)}–${fmt(wMax)}`;
  const c = plan.backward.ctg;
  if (!plan.reachable) {
    const empty = plan.backward.emptyFromStep;
    const why = empty >= 0
      ? `from t = ${d.time_s[empty].toFixed(0)} s on, no SOC in the battery window can still reach it with the candidate controls and the battery limits`
      : `from the initial SOC ${fmt(socInitial)}; at t = 0 only SOC ${fmt(c.lo[0])}–${fmt(c.hi[0])} can reach it`;
    out.push(finding("infeasible", "dp_window_unreachable",
      `DP: the terminal SOC window ${window} cannot be met: ${why}. The plan gets as close as the limits allow: final SOC ${fmt(socFinal)}, missing the window by ${fmt(miss)}.`,
      empty >= 0 ? d.time_s[empty] : null, empty >= 0 ? d.n * d.dt_s : null));
    return out;
  }
  const off = plan.strategy.offPlanSteps;
  if (miss > 1e-9) {
    out.push(finding("infeasible", "dp_window_missed",
      `DP: final SOC ${fmt(socFinal)} misses the terminal window ${window} by ${fmt(miss, 6)}${off > 0 ? ` after the plan lost the window at t = ${d.time_s[plan.strategy.firstOffPlanStep].toFixed(0)} s (grid error; try more SOC points)` : ""}.`));
  } else if (off > 0) {
    const k = plan.strategy.firstOffPlanStep;
    out.push(finding("warning", "dp_off_plan",
      `DP: on ${off} step(s) from t = ${d.time_s[k].toFixed(0)} s the cost-to-go gave no feasible candidate at the simulated SOC (interpolation error); the plan steered back towards the window and met it.`,
      d.time_s[k], null, off));
  }
  return out;
}

/** Grid sensitivity (DESIGN §1: flag DP grids too coarse): fuel of the requested grid vs a pass with every other SOC point. */
export function dpGridFinding(socPoints: number, fuel_j: number, coarsePoints: number, coarseFuel_j: number): Finding | null {
  const ref = Math.max(Math.abs(fuel_j), 1e-9);
  const rel = (coarseFuel_j - fuel_j) / ref;
  if (!(Math.abs(rel) > 0.01)) return null;
  return finding("warning", "dp_grid_sensitive",
    `DP: with ${coarsePoints} SOC points instead of ${socPoints} the fuel changes by ${(rel * 100).toFixed(2)} % (more than 1 %): the SOC grid is too coarse for this cycle; the lower bound is uncertain by about that much.`);
}
