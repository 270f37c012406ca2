import type { FullLoadCurve } from "./full-load-curve";

/**
 * Best-fuel operating line of an engine–generator set under the pure Willans model: fuel
 * power (P + P_0(ω))/e grows with ω, so for a shaft power P the best point is the lowest
 * speed ω ≥ idle whose full-load power T(ω)·ω reaches P. On each linear segment of the
 * full-load curve T = c + s·ω, so T·ω = s·ω² + c·ω and the crossing is a quadratic root,
 * solved in closed form (no grid).
 */
export class OperatingLine {
  private readonly a: Float64Array; // segment start speed (rad/s), clipped to idle..max
  private readonly b: Float64Array; // segment end speed
  private readonly s: Float64Array; // slope dT/dω
  private readonly c: Float64Array; // intercept T(0) of the segment's line
  readonly idle_rad_s: number;
  /** Highest full-load power on idle..max, and the lowest speed where it occurs. */
  readonly maxPower_w: number;
  readonly maxPowerSpeed_rad_s: number;

  constructor(curve: FullLoadCurve, idle_rad_s: number, max_rad_s: number) {
    const x = curve.speed_rad_s;
    const y = curve.torque_nm;
    const a: number[] = [], b: number[] = [], s: number[] = [], c: number[] = [];
    for (let i = 0; i + 1 < x.length; i++) {
      const lo = Math.max(x[i], idle_rad_s);
      const hi = Math.min(x[i + 1], max_rad_s);
      if (!(hi > lo)) continue;
      const slope = (y[i + 1] - y[i]) / (x[i + 1] - x[i]);
      a.push(lo); b.push(hi); s.push(slope); c.push(y[i] - slope * x[i]);
    }
    this.a = Float64Array.from(a); this.b = Float64Array.from(b);
    this.s = Float64Array.from(s); this.c = Float64Array.from(c);
    this.idle_rad_s = idle_rad_s;
    let best = -Infinity, bestW = idle_rad_s;
    for (let i = 0; i < a.length; i++) {
      const cand = [a[i], b[i]];
      if (s[i] < 0) {
        const vertex = -c[i] / (2 * s[i]);
        if (vertex > a[i] && vertex < b[i]) cand.push(vertex);
      }
      for (const w of cand) {
        const p = (s[i] * w + c[i]) * w;
        if (p > best || (p === best && w < bestW)) { best = p; bestW = w; }
      }
    }
    this.maxPower_w = best;
    this.maxPowerSpeed_rad_s = bestW;
  }

  /**
   * Lowest speed ≥ idle with full-load power ≥ p_w. Returns −1 when p_w exceeds maxPower_w.
   */
  speedFor_rad_s(p_w: number): number {
    const n = this.a.length;
    for (let i = 0; i < n; i++) {
      const a = this.a[i], b = this.b[i], s = this.s[i], c = this.c[i];
      if ((s * a + c) * a >= p_w) return a; // reached at the segment start (idle or a breakpoint)
      const root = firstRootAbove(s, c, p_w, a);
      if (root <= b) return root > a ? root : a;
    }
    return -1;
  }
}

/** Smallest root ω > a of s·ω² + c·ω − p = 0, or +Infinity when there is none. */
function firstRootAbove(s: number, c: number, p: number, a: number): number {
  if (s === 0) return c > 0 ? p / c : Infinity;
  const disc = c * c + 4 * s * p;
  if (disc < 0) return Infinity;
  const sq = Math.sqrt(disc);
  // Numerically stable pair of roots of s·ω² + c·ω − p.
  const q = -0.5 * (c + (c >= 0 ? sq : -sq));
  const r1 = q / s;
  const r2 = q !== 0 ? -p / q : Infinity;
  const lo = Math.min(r1, r2), hi = Math.max(r1, r2);
  if (lo >= a) return lo;
  if (hi >= a) return hi;
  return Infinity;
}
