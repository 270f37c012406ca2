/**
 * Resampling of a sampled signal to a uniform step by linear interpolation.
 * Times are strictly increasing (checked before).
 */

/** Median of the row spacings, rounded to 1 ms so that jittery logs give a clean step. */
export function medianSpacing_s(time_s: readonly number[]): number {
  const gaps: number[] = [];
  for (let k = 1; k < time_s.length; k++) gaps.push(time_s[k] - time_s[k - 1]);
  gaps.sort((a, b) => a - b);
  const m = gaps.length % 2 === 1 ? gaps[(gaps.length - 1) / 2] : 0.5 * (gaps[gaps.length / 2 - 1] + gaps[gaps.length / 2]);
  const rounded = Math.round(m * 1000) / 1000;
  return rounded > 0 ? rounded : m;
}

/** Number of whole steps of dt in the span (tolerant of floating-point noise). */
export function stepCount(span_s: number, dt_s: number): number {
  return Math.floor(span_s / dt_s + 1e-9);
}

/** True when every row already sits on the grid t0 + k·dt. */
export function onGrid(time_s: readonly number[], dt_s: number): boolean {
  const t0 = time_s[0];
  return time_s.every((t, k) => Math.abs(t - t0 - k * dt_s) <= 1e-9 * Math.max(1, Math.abs(t)));
}

/** Values at t0 + k·dt, k = 0..n, interpolated linearly between the rows around each. */
export function resampleLinear(time_s: readonly number[], values: readonly number[], dt_s: number, n: number): number[] {
  const out = new Array<number>(n + 1);
  const t0 = time_s[0];
  let j = 0;
  for (let k = 0; k <= n; k++) {
    const t = t0 + k * dt_s;
    while (j + 1 < time_s.length - 1 && time_s[j + 1] <= t) j++;
    const span = time_s[j + 1] - time_s[j];
    const u = span > 0 ? Math.min(1, Math.max(0, (t - time_s[j]) / span)) : 0;
    out[k] = values[j] + (values[j + 1] - values[j]) * u;
  }
  return out;
}
