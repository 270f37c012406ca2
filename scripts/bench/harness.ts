/** Small timing helpers shared by the bench sections. */
export interface Timing {
  median_ms: number;
  min_ms: number;
  runs: number;
}

/** Runs `fn` for ~`budget_ms` (at least `minRuns` times) after a warm-up; median wall time per call. */
export function time(fn: () => unknown, budget_ms = 1500, minRuns = 15): Timing {
  const warmEnd = performance.now() + Math.min(300, budget_ms / 4);
  while (performance.now() < warmEnd) fn();
  const samples: number[] = [];
  const end = performance.now() + budget_ms;
  while (samples.length < minRuns || performance.now() < end) {
    const t0 = performance.now();
    fn();
    samples.push(performance.now() - t0);
    if (samples.length > 100_000) break;
  }
  samples.sort((a, b) => a - b);
  return { median_ms: samples[Math.floor(samples.length / 2)], min_ms: samples[0], runs: samples.length };
}

export function heapUsed_mb(): number {
  return process.memoryUsage().heapUsed / (1024 * 1024);
}

export function table(headers: string[], rows: (string | number)[][]): string {
  const cells = [headers, ...rows.map((r) => r.map(String))];
  const widths = headers.map((_, i) => Math.max(...cells.map((r) => r[i].length)));
  const line = (r: string[]) => r.map((c, i) => (i === 0 ? c.padEnd(widths[i]) : c.padStart(widths[i]))).join("  ");
  return [line(cells[0]), widths.map((w) => "-".repeat(w)).join("  "), ...cells.slice(1).map(line)].join("\n");
}
