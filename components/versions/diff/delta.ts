// Formatting of deltas: sign always shown, relative change in %, "—" for no value.
import { fmt } from "@/lib/client/notebook/format";

export function signed(x: number | null, decimals: number): string {
  if (x === null || !Number.isFinite(x)) return "—";
  const s = fmt(x, decimals);
  return x > 0 && !/^0\.?0*$/.test(s) ? `+${s}` : s;
}

export function percent(x: number | null): string {
  return x === null || !Number.isFinite(x) ? "" : `${signed(100 * x, 1)} %`;
}

/** Decimals that show a figure of this size sensibly. */
export function decimalsFor(x: number | null): number {
  if (x === null) return 2;
  const a = Math.abs(x);
  return a >= 1000 ? 0 : a >= 100 ? 1 : a >= 1 ? 2 : 3;
}

export function deltaClass(delta: number | null, lowerIsBetter = true): string {
  if (delta === null || delta === 0) return "text-muted";
  return (delta < 0) === lowerIsBetter ? "text-ok" : "text-danger";
}

/** Does the evaluated value only repeat the text ("0.30" and "0.3", "3.6, 2.1" and "3.6, 2.1")? */
export function sameAsText(text: string, value: string): boolean {
  const nums = (s: string) => s.replace(/−/g, "-").split(",").map((x) => x.trim());
  const a = nums(text);
  const b = nums(value);
  if (a.length !== b.length) return false;
  return a.every((x, i) => x === b[i] || (x !== "" && Number.isFinite(Number(x)) && Number(x) === Number(b[i])));
}
