import type { Episode } from "./episodes";
import type { Demand } from "./demand";
import type { Ledger } from "./ledger";
import type { Scenario } from "./scenario/schema";
import { VIOLATION_INFO } from "./step-output";

export interface Finding {
  severity: "infeasible" | "warning";
  code: string;
  component: string;
  message: string;
  /** Time range of the episode (start of its first step to end of its last), or null for whole-run findings. */
  time_start_s: number | null;
  time_end_s: number | null;
  steps: number;
  /** The worst step of the episode: demanded vs available, in `unit`. */
  worst: { time_s: number; demanded: number; available: number; unit: string } | null;
}

/** More separate episodes of one kind than this are summarised in one extra finding. */
const MAX_EPISODES_PER_KIND = 12;

function fmt(x: number): string {
  const a = Math.abs(x);
  return a >= 100 ? x.toFixed(0) : a >= 1 ? x.toFixed(2) : x.toPrecision(3);
}

/** Both figures in the short form, with more digits when that would print them alike. */
function fmtPair(a: number, b: number): [string, string] {
  let sa = fmt(a), sb = fmt(b);
  for (let digits = 4; sa === sb && a !== b && digits <= 12; digits++) [sa, sb] = [a.toPrecision(digits), b.toPrecision(digits)];
  return [sa, sb];
}

function episodeFinding(e: Episode[], d: Demand): Finding {
  const first = e[0];
  const info = VIOLATION_INFO[first.violation];
  let worst = first;
  let steps = 0;
  for (const x of e) {
    steps += x.steps;
    if (Math.abs(x.demanded - x.available) > Math.abs(worst.demanded - worst.available)) worst = x;
  }
  const last = e[e.length - 1];
  const t0 = d.time_s[first.firstStep];
  const t1 = d.time_s[last.lastStep] + d.dt_s;
  const dem = worst.demanded * info.scale;
  const av = worst.available * info.scale;
  const unit = info.unit ? ` ${info.unit}` : "";
  const [demText, avText] = fmtPair(dem, av);
  const where = e.length > 1 ? `${e.length} episodes between t = ${fmt(t0)} s and ${fmt(t1)} s` : `t = ${fmt(t0)}–${fmt(t1)} s`;
  return {
    severity: "infeasible",
    code: info.code,
    component: info.component,
    message: `${info.what}: ${where} (${steps} step${steps === 1 ? "" : "s"}); worst at t = ${fmt(d.time_s[worst.worstStep])} s: ${demText}${unit} demanded, ${avText}${unit} available`,
    time_start_s: t0,
    time_end_s: t1,
    steps,
    worst: { time_s: d.time_s[worst.worstStep], demanded: dem, available: av, unit: info.unit },
  };
}

/** One finding per episode, with many short episodes of the same kind folded together. */
export function infeasibleFindings(episodes: readonly Episode[], d: Demand): Finding[] {
  const byKind = new Map<number, Episode[]>();
  for (const e of episodes) {
    const list = byKind.get(e.violation) ?? [];
    list.push(e);
    byKind.set(e.violation, list);
  }
  const out: Finding[] = [];
  for (const list of byKind.values()) {
    list.sort((a, b) => a.firstStep - b.firstStep);
    const separate = list.length > MAX_EPISODES_PER_KIND ? list.slice(0, MAX_EPISODES_PER_KIND - 1) : list;
    for (const e of separate) out.push(episodeFinding([e], d));
    if (separate.length < list.length) out.push(episodeFinding(list.slice(separate.length), d));
  }
  return out.sort((a, b) => (a.time_start_s ?? 0) - (b.time_start_s ?? 0));
}

function warning(code: string, component: string, message: string): Finding {
  return { severity: "warning", code, component, message, time_start_s: null, time_end_s: null, steps: 0, worst: null };
}

/**
 * Charge sustenance: the net battery energy should stay within 1 % of the fuel energy
 * (the same order as the charge-balance tolerance of UNECE R101 Annex 8; from memory).
 */
export function chargeSustainingWarning(s: Scenario, l: Ledger, socInitial: number, socFinal: number): Finding | null {
  if (s.powertrain !== "parallel" && s.powertrain !== "series") return null;
  if (Math.abs(l.battery_net) <= 0.01 * Math.abs(l.fuel) + 1) return null;
  const dir = l.battery_net > 0 ? "depleted" : "charged";
  return warning(
    "not_charge_sustaining", "battery",
    `hybrid is not charge-sustaining: the battery ${dir} ${fmt(Math.abs(l.battery_net) / 3.6e6)} kWh net (SOC ${fmt(socInitial)} → ${fmt(socFinal)}), more than 1 % of the fuel energy; compare fuel figures only with a SOC correction`,
  );
}

/** SOC within 1 % of the window from a bound for more than 10 % of the steps (common practice, no source). */
export function socPinnedWarnings(s: Scenario, soc: readonly number[], socFinal: number): Finding[] {
  const b = s.battery;
  if (!b || soc.length === 0) return [];
  const tol = 0.01 * (b.soc_max - b.soc_min);
  let low = 0, high = 0;
  for (let k = 0; k < soc.length; k++) {
    const x = k + 1 < soc.length ? soc[k + 1] : socFinal;
    if (x <= b.soc_min + tol) low++;
    else if (x >= b.soc_max - tol) high++;
  }
  const out: Finding[] = [];
  const share = (c: number) => `${((100 * c) / soc.length).toFixed(0)} % of the steps`;
  if (low > 0.1 * soc.length) out.push(warning("soc_pinned_low", "battery", `SOC sits at soc_min (${b.soc_min}) for ${share(low)}: the battery window limits the result`));
  if (high > 0.1 * soc.length) out.push(warning("soc_pinned_high", "battery", `SOC sits at soc_max (${b.soc_max}) for ${share(high)}: regeneration is being refused`));
  return out;
}

/** Blocks present in the scenario that its powertrain does not use. */
export function unusedBlockWarnings(s: Scenario): Finding[] {
  const used: Record<Scenario["powertrain"], string[]> = {
    conventional: ["engine"], bev: ["motor", "battery"],
    parallel: ["engine", "motor", "battery", "strategy"], series: ["engine", "generator", "motor", "battery", "strategy"],
  };
  const out: Finding[] = [];
  for (const block of ["engine", "motor", "generator", "battery", "strategy"] as const)
    if (s[block] !== undefined && !used[s.powertrain].includes(block))
      out.push(warning("unused_block", block, `the ${block} block is not used by powertrain '${s.powertrain}'`));
  return out;
}

/** Parameter values outside the usual range for passenger cars (ranges from REFERENCES.md, from memory). */
export function parameterWarnings(s: Scenario): Finding[] {
  const out: Finding[] = [];
  const check = (path: string, value: number, lo: number, hi: number, why: string) => {
    if (value < lo || value > hi) out.push(warning("suspicious_parameter", path.split(".")[0], `${path} = ${value} is outside the usual ${lo}–${hi} (${why}); check it`));
  };
  const v = s.vehicle;
  check("vehicle.rolling_resistance", v.rolling_resistance, 0.005, 0.02, "car tyres on asphalt");
  check("vehicle.drag_coefficient", v.drag_coefficient, 0.2, 0.5, "passenger cars");
  if (s.engine) check("engine.willans_efficiency", s.engine.willans_efficiency, 0.3, 0.55, "Willans e of SI and diesel engines");
  return out;
}
