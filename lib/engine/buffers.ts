/**
 * `count` Float64Array views of length n over one ArrayBuffer: one allocation instead of
 * `count` (typed-array allocations are costly next to an 1800-step simulation).
 */
export function f64Views(n: number, count: number): Float64Array[] {
  const buf = new ArrayBuffer(8 * n * count);
  const views: Float64Array[] = [];
  for (let i = 0; i < count; i++) views.push(new Float64Array(buf, 8 * n * i, n));
  return views;
}

/** A plain number array of length n filled with zeros (packed doubles once written). */
export function zeros(n: number): number[] {
  const a = new Array<number>(n);
  for (let i = 0; i < n; i++) a[i] = 0;
  return a;
}
