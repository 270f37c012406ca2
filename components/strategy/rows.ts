import type { Comparison } from "@/lib/engine/strategies/compare";

/** Rows for the fuel bars: each strategy's burnt and SOC-corrected fuel. */
export function fuelRows(c: Comparison): { strategy: string; measure: string; grams: number }[] {
  return c.strategies.flatMap((s) => [
    { strategy: s.label, measure: "burnt", grams: s.fuel_g },
    { strategy: s.label, measure: "SOC-corrected", grams: s.fuel_corrected_g },
  ]);
}

/** SOC traces, thinned to at most `maxPoints` per strategy (charts need no more). */
export function socRows(c: Comparison, maxPoints = 600): { strategy: string; time_s: number; soc: number }[] {
  const rows: { strategy: string; time_s: number; soc: number }[] = [];
  const dt = c.duration_s / Math.max(1, c.strategies[0]?.soc.length ?? 1);
  for (const s of c.strategies) {
    const every = Math.max(1, Math.ceil(s.soc.length / maxPoints));
    for (let k = 0; k < s.soc.length; k += every) rows.push({ strategy: s.label, time_s: k * dt, soc: s.soc[k] });
    rows.push({ strategy: s.label, time_s: c.duration_s, soc: s.soc_final });
  }
  return rows;
}
