import type { CandidateTables } from "./tables";
import type { BatteryStep } from "./battery-step";

/**
 * When no candidate of step k respects the battery limits at SOC s (the plan was pushed
 * outside what the model allows), the one that breaks them least: the smallest excess of
 * current over its limit, with SOC-window excess converted to current (A). The simulator
 * then reports the step as infeasible; nothing is hidden.
 */
export function leastViolatingSlot(t: CandidateTables, bs: BatteryStep, k: number, s: number): number {
  const b = bs.battery;
  const u = b.ocv_v(s);
  const pMax = b.maxPower_w(u);
  const brakes = t.braking[k] !== 0;
  const cl = brakes ? b.chargeLimit_w(s, t.dt_s) : 0;
  let best = -1;
  let bestExcess = Infinity;
  for (let slot = t.start[k], end = t.start[k + 1]; slot < end; slot++) {
    const raw = brakes ? Math.max(t.bus_w[slot], Math.min(cl, t.busOther_w[slot])) : t.bus_w[slot];
    const p = raw > pMax ? pMax : raw;
    const disc = u * u - bs.r4 * p;
    const i = (2 * p) / (u + Math.sqrt(disc > 0 ? disc : 0));
    const s1 = s - i * bs.socPerAmp;
    let excess = Math.max(0, i - bs.maxDischarge_a, -i - bs.maxCharge_a) + (raw - p) / u;
    if (i > 0 && s1 < bs.socMin) excess += (bs.socMin - s1) / bs.socPerAmp;
    if (i < 0 && s1 > bs.socMax) excess += (s1 - bs.socMax) / bs.socPerAmp;
    if (excess < bestExcess) {
      bestExcess = excess;
      best = slot;
    }
  }
  return best;
}
