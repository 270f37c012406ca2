/**
 * Engine section of `npm run bench`: median time per full evaluation (cycle build, demand
 * precomputation, simulation, findings and the Result with plain-array traces; the scenario
 * is parsed once outside the timing) for each powertrain on an 1800-step and a 36,000-step
 * synthetic cycle. Target (issue 3): < 0.5 ms median per 1800-step evaluation.
 */
import { readFileSync } from "node:fs";
import { cpus, loadavg } from "node:os";
import { evaluateScenario, parseScenario, type Scenario } from "../../lib/engine/index";
import { heapUsed_mb, table, time } from "./harness";

/** A repeatable urban/extra-urban mix with stops, 1 s samples (not a regulatory cycle). */
export function syntheticCycle_kmh(steps: number): number[] {
  const v = new Array<number>(steps + 1);
  for (let k = 0; k <= steps; k++) {
    const t = k % 600;
    const urban = t < 300;
    const phase = urban ? t % 100 : (t - 300) % 300;
    const top = urban ? 50 : 110;
    const len = urban ? 100 : 300;
    let x: number;
    if (phase < 10) x = 0; // stop
    else if (phase < len * 0.35) x = top * ((phase - 10) / (len * 0.35 - 10));
    else if (phase < len * 0.8) x = top * (0.9 + 0.1 * Math.sin(phase / 7));
    else x = top * 0.9 * Math.max(0, (len - phase) / (len * 0.2));
    v[k] = Math.max(0, Math.round(x * 100) / 100);
  }
  v[0] = 0;
  v[steps] = 0;
  return v;
}

function load(powertrain: string, steps: number): Scenario {
  const raw = JSON.parse(readFileSync(new URL(`../../examples/${powertrain}.json`, import.meta.url), "utf8"));
  raw.cycle = { dt_s: 1, speed_kmh: syntheticCycle_kmh(steps) };
  const parsed = parseScenario(raw);
  if (!parsed.ok) throw new Error(parsed.errors.map((e) => e.message).join("\n"));
  return parsed.scenario;
}

export function benchEngine(): { rows: (string | number)[][]; worst1800_ms: number } {
  const rows: (string | number)[][] = [];
  let worst = 0;
  for (const p of ["conventional", "bev", "parallel", "series"]) {
    const row: (string | number)[] = [p];
    for (const steps of [1800, 36000]) {
      const s = load(p, steps);
      const check = evaluateScenario(s);
      if (!check.ok) throw new Error(`${p}: ${check.errors[0].message}`);
      const t = time(() => evaluateScenario(s), steps > 2000 ? 2500 : 1500);
      if (steps === 1800) worst = Math.max(worst, t.median_ms);
      row.push(t.median_ms.toFixed(3), t.min_ms.toFixed(3), ((t.median_ms * 1e6) / steps).toFixed(0));
      if (steps === 36000) row.push(check.result.kpi.feasible ? "yes" : "no");
    }
    row.push(heapUsed_mb().toFixed(1));
    rows.push(row);
  }
  return { rows, worst1800_ms: worst };
}

export function printEngineSection(): boolean {
  const { rows, worst1800_ms } = benchEngine();
  console.log(`Engine: one full evaluation per run (Result with traces), single thread; load average ${loadavg()[0].toFixed(2)} on ${cpus().length} cores`);
  console.log(table(["powertrain", "1800: median ms", "min ms", "ns/step", "36000: median ms", "min ms", "ns/step", "feasible", "heap MB"], rows));
  const ok = worst1800_ms < 0.5;
  console.log(`target < 0.5 ms median per 1800-step evaluation: ${ok ? "met" : "NOT met"} (worst ${worst1800_ms.toFixed(3)} ms)\n`);
  return ok;
}
