import type { Comparison } from "@/lib/engine/strategies/compare";
import { INK, LOSS, MUTED } from "@/components/charts/theme";

/** Line colours of the strategies in the SOC chart, in the comparison's order (rule, ECMS, DP). */
export const SOC_COLORS = [MUTED, LOSS, INK];

const fixed = (x: number, digits: number) => x.toLocaleString("en-GB", { minimumFractionDigits: digits, maximumFractionDigits: digits });

/** "+1.2", "\u22120.4", and "0.0" for anything that rounds to zero (never "\u22120.0"). */
export function signed(x: number, digits = 1): string {
  const shown = Number(x.toFixed(digits));
  if (shown === 0) return fixed(0, digits);
  return `${shown > 0 ? "+" : "\u2212"}${fixed(Math.abs(shown), digits)}`;
}

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
