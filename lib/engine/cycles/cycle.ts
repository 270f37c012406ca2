/**
 * A sampled drive cycle: N+1 speed samples every dt_s seconds, N intervals.
 * grade_rad[k] applies to interval k (the grade at its start sample).
 */
export interface Cycle {
  name: string;
  dt_s: number;
  speed_m_s: Float64Array;
  grade_rad: Float64Array | null;
}

export function intervalCount(cycle: Cycle): number {
  return cycle.speed_m_s.length - 1;
}
