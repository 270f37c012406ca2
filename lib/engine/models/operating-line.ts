import type { FullLoadCurve } from "./full-load-curve";

/**
 * Relative slack when deciding whether a segment reaches a requested power: the request
 * and the segment ends come from different roundings of the same number (e.g. a request
 * equal to a breakpoint's power), and a rounding unit must not send the search on to a
 * later segment at a much higher speed.
 */
const REACH_SLACK = 1e-12;

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
  private readonly peak: Float64Array; // highest full-load power on the segment
  readonly idle_rad_s: number;
  /** Highest full-load power on idle..max, and the lowest speed where it occurs. */
  readonly maxPower_w: number;
  readonly maxPowerSpeed_rad_s: number;

  constructor(curve: FullLoadCurve, idle_rad_s: number, max_rad_s: number) {
    const x = curve.speed_rad_s;
    const y = curve.torque_nm;
    const a: number[] = [], b: number[] = [], s: number[] = [], c: number[] = [], peak: number[] = [];
    for (let i = 0; i + 1 < x.length; i++) {
      const lo = Math.max(x[i], idle_rad_s);
      const hi = Math.min(x[i + 1], max_rad_s);
      if (!(hi > lo)) continue;
      const slope = (y[i + 1] - y[i]) / (x[i + 1] - x[i]);
      a.push(lo); b.push(hi); s.push(slope); c.push(y[i] - slope * x[i]); peak.push(-Infinity);
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
        if (p > peak[i]) peak[i] = p;
        if (p > best || (p === best && w < bestW)) { best = p; bestW = w; }
      }
    }
    this.peak = Float64Array.from(peak);
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
      if (!(this.peak[i] >= p_w * (1 - REACH_SLACK))) continue;
      // Below p at a and reaching p on the segment: the crossing is the root where T·ω rises.
      const w = risingRoot(s, c, p_w);
      return w < a ? a : w > b ? b : w;
    }
    return p_w <= this.maxPower_w ? this.maxPowerSpeed_rad_s : -1;
  }
}

/**
 * The root of s·ω² + c·ω − p = 0 where s·ω² + c·ω rises (2sω + c > 0):
 * ω = (√(c² + 4sp) − c)/(2s), written as 2p/(c + √(c² + 4sp)) when c ≥ 0 so that s = 0
 * and small s keep full precision. A discriminant rounded below zero is taken as zero.
 */
function risingRoot(s: number, c: number, p: number): number {
  const disc = c * c + 4 * s * p;
  const sq = Math.sqrt(disc > 0 ? disc : 0);
  return c >= 0 ? (2 * p) / (c + sq) : (sq - c) / (2 * s);
}
