import type { Cycle } from "./cycle";
import { kmhToMs } from "../units";

/** A user cycle from samples; lengths and values were checked by the scenario rules. */
export function buildCustomCycle(dt_s: number, speed_kmh: readonly number[], grade_pct?: readonly number[]): Cycle {
  const speed = new Float64Array(speed_kmh.length);
  for (let k = 0; k < speed.length; k++) speed[k] = kmhToMs(speed_kmh[k]);
  let grade: Float64Array | null = null;
  if (grade_pct && grade_pct.some((g) => g !== 0)) {
    grade = new Float64Array(grade_pct.length);
    for (let k = 0; k < grade.length; k++) grade[k] = Math.atan(grade_pct[k] / 100);
  }
  return { name: "custom", dt_s, speed_m_s: speed, grade_rad: grade };
}
