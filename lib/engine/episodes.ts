import { S_DEMANDED, S_VIOLATIONS, VIOLATION_COUNT } from "./step-output";

/** A run of consecutive steps breaking the same limit, with its worst step. */
export interface Episode {
  violation: number;
  firstStep: number;
  lastStep: number;
  steps: number;
  worstStep: number;
  demanded: number;
  available: number;
}

/**
 * Groups infeasible steps into episodes online, without allocating on ordinary steps:
 * per violation kind it keeps the open episode in typed arrays and creates an object only
 * when an episode closes.
 */
export class EpisodeTracker {
  readonly episodes: Episode[] = [];
  infeasibleSteps = 0;
  private openCount = 0;
  private readonly open = new Uint8Array(VIOLATION_COUNT);
  private readonly first = new Int32Array(VIOLATION_COUNT);
  private readonly count = new Int32Array(VIOLATION_COUNT);
  private readonly worstStep = new Int32Array(VIOLATION_COUNT);
  private readonly worstExcess = new Float64Array(VIOLATION_COUNT);
  private readonly worstDemanded = new Float64Array(VIOLATION_COUNT);
  private readonly worstAvailable = new Float64Array(VIOLATION_COUNT);

  step(k: number, out: Float64Array): void {
    const mask = out[S_VIOLATIONS];
    if (mask === 0 && this.openCount === 0) return;
    if (mask !== 0) this.infeasibleSteps++;
    for (let v = 0; v < VIOLATION_COUNT; v++) {
      const hit = (mask & (1 << v)) !== 0;
      if (hit) {
        const dem = out[S_DEMANDED + 2 * v];
        const av = out[S_DEMANDED + 2 * v + 1];
        const excess = Math.abs(dem - av);
        if (this.open[v] === 0) {
          this.open[v] = 1;
          this.openCount++;
          this.first[v] = k;
          this.count[v] = 0;
          this.worstExcess[v] = -1;
        }
        this.count[v]++;
        if (excess > this.worstExcess[v]) {
          this.worstExcess[v] = excess;
          this.worstStep[v] = k;
          this.worstDemanded[v] = dem;
          this.worstAvailable[v] = av;
        }
      } else if (this.open[v] !== 0) this.close(v, k - 1);
    }
  }

  finish(lastStep: number): void {
    for (let v = 0; v < VIOLATION_COUNT; v++) if (this.open[v] !== 0) this.close(v, lastStep);
  }

  private close(v: number, lastStep: number): void {
    this.open[v] = 0;
    this.openCount--;
    this.episodes.push({
      violation: v, firstStep: this.first[v], lastStep, steps: this.count[v],
      worstStep: this.worstStep[v], demanded: this.worstDemanded[v], available: this.worstAvailable[v],
    });
  }
}
