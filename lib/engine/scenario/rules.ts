import type { Scenario } from "./schema";
import { makeError, type PathPart, type ScenarioError } from "./errors";
import { standardCycleDuration_s } from "../cycles/standard";

/**
 * Cross-field rules of Scenario v1, run after the shape has parsed. Each check pushes an
 * error naming the path, the offending value and the rule; all checks run so the user
 * sees every problem at once.
 */
type Push = (parts: PathPart[], rule: string, value?: unknown) => void;

function strictlyIncreasing(values: readonly number[]): number {
  for (let i = 1; i < values.length; i++) if (!(values[i] > values[i - 1])) return i;
  return -1;
}

function checkBreakpoints(push: Push, base: PathPart[], xKey: string, yKey: string, xs: number[], ys: number[]): boolean {
  let ok = true;
  if (xs.length !== ys.length) {
    push([...base, yKey], `${ys.length} values for ${xs.length} breakpoints in ${xKey}; need ${xs.length}`);
    ok = false;
  }
  const bad = strictlyIncreasing(xs);
  if (bad >= 0) {
    push([...base, xKey], `breakpoints must be sorted strictly increasing; item ${bad} (${xs[bad]}) does not exceed item ${bad - 1} (${xs[bad - 1]})`);
    ok = false;
  }
  return ok;
}

function checkCycle(s: Scenario, push: Push): void {
  const c = s.cycle;
  if (c.standard !== undefined) {
    if (c.speed_kmh !== undefined || c.grade_pct !== undefined)
      push(["cycle"], "give either a standard cycle or speed_kmh samples, not both", Object.keys(c));
    const dt = c.dt_s ?? 1;
    const duration = standardCycleDuration_s(c.standard);
    const n = duration / dt;
    if (Math.abs(n - Math.round(n)) > 1e-9 * Math.max(1, n))
      push(["cycle", "dt_s"], `must divide the ${duration} s duration of '${c.standard}' into whole steps`, dt);
    else if (Math.round(n) > 1_000_000) push(["cycle", "dt_s"], "too small: more than 1,000,000 steps", dt);
    return;
  }
  if (c.speed_kmh === undefined) {
    push(["cycle"], "needs either 'standard' (ece15, eudc, nedc) or 'speed_kmh' samples with 'dt_s'", c);
    return;
  }
  if (c.dt_s === undefined) push(["cycle", "dt_s"], "is required with speed_kmh samples");
  if (c.speed_kmh.length < 2) push(["cycle", "speed_kmh"], `needs at least 2 samples; has ${c.speed_kmh.length}`);
  if (c.speed_kmh.length > 1_000_001) push(["cycle", "speed_kmh"], "too many samples (limit 1,000,001)", c.speed_kmh.length);
  if (c.grade_pct !== undefined && c.grade_pct.length !== c.speed_kmh.length)
    push(["cycle", "grade_pct"], `${c.grade_pct.length} values for ${c.speed_kmh.length} speed samples; need ${c.speed_kmh.length}`);
}

function checkDriveline(s: Scenario, push: Push): void {
  const d = s.driveline;
  const gears = d.gear_ratios.length;
  const th = d.upshift_speeds_kmh;
  if (th.length !== gears - 1)
    push(["driveline", "upshift_speeds_kmh"], `${th.length} thresholds for ${gears} gears; need ${gears - 1}`);
  const bad = strictlyIncreasing(th);
  if (bad >= 0)
    push(["driveline", "upshift_speeds_kmh"], `thresholds must be strictly increasing; item ${bad} (${th[bad]}) does not exceed item ${bad - 1} (${th[bad - 1]})`);
}

function checkEngine(s: Scenario, push: Push): void {
  const e = s.engine;
  if (!e) return;
  if (!(e.max_speed_rpm > e.idle_speed_rpm))
    push(["engine", "max_speed_rpm"], `must exceed idle_speed_rpm (${e.idle_speed_rpm})`);
  const fl = e.max_torque_nm;
  if (!checkBreakpoints(push, ["engine", "max_torque_nm"], "speed_rpm", "torque_nm", fl.speed_rpm, fl.torque_nm)) return;
  const first = fl.speed_rpm[0];
  const last = fl.speed_rpm[fl.speed_rpm.length - 1];
  if (first > e.idle_speed_rpm || last < e.max_speed_rpm)
    push(["engine", "max_torque_nm", "speed_rpm"], `must span idle_speed_rpm..max_speed_rpm (${e.idle_speed_rpm}..${e.max_speed_rpm}); covers ${first}..${last}`);
}

function checkBattery(s: Scenario, push: Push): void {
  const b = s.battery;
  if (!b) return;
  checkBreakpoints(push, ["battery", "ocv"], "soc", "voltage_v", b.ocv.soc, b.ocv.voltage_v);
  if (!(b.soc_min < b.soc_max)) push(["battery", "soc_min"], `must be below soc_max (${b.soc_max})`);
  if (b.soc_initial < b.soc_min || b.soc_initial > b.soc_max)
    push(["battery", "soc_initial"], `must lie in the window soc_min..soc_max (${b.soc_min}..${b.soc_max})`);
}

const NEEDS: Record<Scenario["powertrain"], readonly ("engine" | "motor" | "generator" | "battery" | "strategy")[]> = {
  conventional: ["engine"],
  bev: ["motor", "battery"],
  parallel: ["engine", "motor", "battery", "strategy"],
  series: ["engine", "generator", "motor", "battery", "strategy"],
};

const STRATEGIES: Record<Scenario["powertrain"], readonly string[]> = {
  conventional: [],
  bev: [],
  parallel: ["rule", "ecms", "dp"],
  series: ["thermostat", "ecms", "dp"],
};

function checkComponents(s: Scenario, push: Push): void {
  for (const block of NEEDS[s.powertrain])
    if (s[block] === undefined) push([block], `powertrain '${s.powertrain}' needs a ${block} block`);
  const st = s.strategy;
  if (!st) return;
  const allowed = STRATEGIES[s.powertrain];
  if (allowed.length > 0 && !allowed.includes(st.kind))
    push(["strategy", "kind"], `powertrain '${s.powertrain}' supports strategies ${allowed.map((k) => `'${k}'`).join(", ")}`);
}

function checkStrategy(s: Scenario, push: Push): void {
  const st = s.strategy;
  const b = s.battery;
  if (!st || !b) return;
  const inWindow = (key: string, v: number) => {
    if (v < b.soc_min || v > b.soc_max) push(["strategy", key], `must lie in the battery window ${b.soc_min}..${b.soc_max}`);
  };
  if (st.kind === "thermostat") {
    if (!(st.soc_on < st.soc_off)) push(["strategy", "soc_on"], `must be below soc_off (${st.soc_off})`);
    inWindow("soc_on", st.soc_on);
    inWindow("soc_off", st.soc_off);
    if (s.generator && st.on_power_kw > s.generator.peak_power_kw)
      push(["strategy", "on_power_kw"], `exceeds the generator peak (${s.generator.peak_power_kw} kW)`);
  } else if (st.kind === "rule") {
    if (st.soc_low !== undefined) inWindow("soc_low", st.soc_low);
    if (st.soc_high !== undefined) inWindow("soc_high", st.soc_high);
    if (st.soc_low !== undefined && st.soc_high !== undefined && !(st.soc_low <= st.soc_high))
      push(["strategy", "soc_low"], `must not exceed soc_high (${st.soc_high})`);
  } else if (st.kind === "ecms") {
    inWindow("soc_target", st.soc_target);
  } else {
    if (!(st.soc_final_min <= st.soc_final_max)) push(["strategy", "soc_final_min"], `must not exceed soc_final_max (${st.soc_final_max})`);
    inWindow("soc_final_min", st.soc_final_min);
    inWindow("soc_final_max", st.soc_final_max);
  }
}

export function checkScenario(s: Scenario, raw: unknown): ScenarioError[] {
  const errors: ScenarioError[] = [];
  const push: Push = (parts, rule, value) => errors.push(makeError(raw, parts, rule, value));
  checkCycle(s, push);
  checkDriveline(s, push);
  checkEngine(s, push);
  checkBattery(s, push);
  checkComponents(s, push);
  checkStrategy(s, push);
  return errors;
}
