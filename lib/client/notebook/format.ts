// Number formatting for figures and tables: fixed decimals chosen per magnitude, a real minus
// sign, and an em dash for "no value" (null, NaN, ±∞ never reach the page).
export function fmt(x: number | null | undefined, decimals = 2): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return "—";
  const s = Math.abs(x) < 0.5 * 10 ** -decimals ? (0).toFixed(decimals) : x.toFixed(decimals);
  return s.replace(/^-/, "−");
}

/** Thousands grouped with a thin space, for joule columns. */
export function fmtGrouped(x: number | null | undefined, decimals = 0): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return "—";
  const [int, frac] = Math.abs(x).toFixed(decimals).split(".");
  const grouped = int!.replace(/\B(?=(\d{3})+(?!\d))/g, "\u2009");
  const sign = x < 0 && Number(int) + Number(frac ?? 0) > 0 ? "−" : "";
  return sign + grouped + (frac ? `.${frac}` : "");
}

export function fmtPct(x: number | null | undefined, decimals = 1): string {
  return x === null || x === undefined || !Number.isFinite(x) ? "—" : `${fmt(x, decimals)} %`;
}

/** A compiled value: four significant digits, no trailing zeros (1.6, 0.745, 42.7, 6000). */
export function fmtValue(x: number | null | undefined): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return "—";
  const text = Math.abs(x) >= 1000 ? x.toFixed(0) : Number(x.toPrecision(4)).toString();
  return text.replace(/^-/, "−");
}
