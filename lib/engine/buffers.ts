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

/**
 * A plain number array of length n for a trace that the caller fills completely, in
 * order (no pre-fill: every element is written before the array leaves the engine).
 */
export function traceArray(n: number): number[] {
  return new Array<number>(n);
}
