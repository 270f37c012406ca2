import { ECE15_OPERATIONS, EUDC_OPERATIONS, NEDC_OPERATIONS, type Operation } from "./r83-tables";
import type { Cycle } from "./cycle";
import { kmhToMs } from "../units";

export type StandardCycleName = "ece15" | "eudc" | "nedc";

const TABLES: Record<StandardCycleName, readonly Operation[]> = {
  ece15: ECE15_OPERATIONS,
  eudc: EUDC_OPERATIONS,
  nedc: NEDC_OPERATIONS,
};

export function operationsOf(name: StandardCycleName): readonly Operation[] {
  return TABLES[name];
}

export function operationsDuration_s(ops: readonly Operation[]): number {
  let total = 0;
  for (const o of ops) total += o.duration_s;
  return total;
}

export function standardCycleDuration_s(name: StandardCycleName): number {
  return operationsDuration_s(TABLES[name]);
}

/**
 * Samples an operation list every dt_s. The caller guarantees that dt_s divides the
 * duration (schema rule); samples falling on operation boundaries then make the
 * trapezoidal distance equal the exact integral of the piecewise-linear profile whenever
 * dt_s also divides every operation duration (e.g. 1, 0.5, 0.25 s).
 */
export function buildFromOperations(name: string, ops: readonly Operation[], dt_s: number): Cycle {
  const starts = new Float64Array(ops.length);
  let t = 0;
  for (let i = 0; i < ops.length; i++) {
    starts[i] = t;
    t += ops[i].duration_s;
  }
  const n = Math.round(t / dt_s);
  const speed = new Float64Array(n + 1);
  let i = 0;
  for (let k = 0; k <= n; k++) {
    const tk = k === n ? t : k * dt_s;
    while (i + 1 < ops.length && starts[i + 1] <= tk) i++;
    const o = ops[i];
    const u = Math.min(1, Math.max(0, (tk - starts[i]) / o.duration_s));
    speed[k] = kmhToMs(o.from_kmh + (o.to_kmh - o.from_kmh) * u);
  }
  return { name, dt_s, speed_m_s: speed, grade_rad: null };
}

export function buildStandardCycle(name: StandardCycleName, dt_s = 1): Cycle {
  return buildFromOperations(name, TABLES[name], dt_s);
}
