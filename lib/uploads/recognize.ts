import { buildStandardCycle } from "@/lib/engine/cycles";
import { msToKmh } from "@/lib/engine/units";
import { fmt } from "./numbers";
import { CHECKSUM_TOLERANCE_KMH, R83_CYCLES, R83_SAMPLE_TOLERANCE_KMH, US_CYCLES, WLTC_3B } from "./published";
import { referenceStats } from "./cycle-stats";

export interface Recognition {
  /** Name of the published cycle it matches, or null. */
  match: string | null;
  /** The sentence shown beside the upload. */
  label: string;
  /** Figures compared, for the record. */
  checks: { figure: string; value: number; published: number; ok: boolean; digits: number }[];
}

type Check = Recognition["checks"][number];
const close = (value: number, published: number, tol: number) => Math.abs(value - published) <= tol;

function wltcChecks(speed_kmh: readonly number[]): Check[] {
  return WLTC_3B.phases.map((p) => {
    let sum = 0;
    for (let t = p.first_s; t <= p.last_s; t++) sum += speed_kmh[t];
    sum = Math.round(sum * 1e6) / 1e6;
    return { figure: `phase ${p.name} speed sum`, value: sum, published: p.checksum_kmh, ok: close(sum, p.checksum_kmh, CHECKSUM_TOLERANCE_KMH), digits: 1 };
  });
}

function r83Checks(id: "ece15" | "eudc" | "nedc", speed_kmh: readonly number[]): Check[] {
  const ref = buildStandardCycle(id, 1).speed_m_s;
  let worst = 0;
  for (let k = 0; k < ref.length; k++) worst = Math.max(worst, Math.abs(speed_kmh[k] - msToKmh(ref[k])));
  return [{ figure: "largest difference from the R83 rebuild (km/h)", value: Number(worst.toFixed(3)), published: 0, ok: worst <= R83_SAMPLE_TOLERANCE_KMH, digits: 2 }];
}

function missText(c: Check): string {
  return `${c.figure} ${c.value.toFixed(c.digits)}, published ${c.published.toFixed(c.digits)}`;
}

function verdict(name: string, checks: Check[], okText: string): Recognition {
  const missed = checks.filter((c) => !c.ok);
  if (missed.length === 0) return { match: name, label: `matches ${name} (${okText})`, checks };
  return { match: null, label: `has the duration of ${name} but not its figures: ${missed.map(missText).join("; ")}`, checks };
}

/**
 * Compares a 1 Hz upload with the published cycles of the same duration: WLTC class 3b by
 * its four phase checksums, the R83 cycles sample by sample against the rebuild, the US
 * cycles by distance and top speed (only summaries are published in REFERENCES.md).
 */
export function recognizeCycle(dt_s: number, speed_kmh: readonly number[]): Recognition {
  if (dt_s !== 1) return { match: null, label: `published cycles are checked at 1 Hz; this cycle has a ${fmt(dt_s)} s step`, checks: [] };
  const duration = speed_kmh.length - 1;
  if (duration === WLTC_3B.duration_s) return verdict(WLTC_3B.name, wltcChecks(speed_kmh), "all four phase checksums");
  for (const r of R83_CYCLES)
    if (duration === r.duration_s) return verdict(r.name, r83Checks(r.id, speed_kmh), `every sample within ${R83_SAMPLE_TOLERANCE_KMH} km/h of the rebuild`);
  const stats = referenceStats(1, speed_kmh);
  for (const u of US_CYCLES) {
    if (duration !== u.duration_s) continue;
    const checks: Check[] = [
      { figure: "distance (km)", value: stats.distance_km, published: u.distance_km, ok: close(stats.distance_km, u.distance_km, u.distance_km * u.distance_rel_tol), digits: 3 },
      { figure: "max speed (km/h)", value: stats.max_speed_kmh, published: u.max_speed_kmh, ok: close(stats.max_speed_kmh, u.max_speed_kmh, u.max_speed_tol_kmh), digits: 1 },
    ];
    return verdict(u.name, checks, `duration, distance and top speed; ${u.source}`);
  }
  const near = [{ name: WLTC_3B.name, duration_s: WLTC_3B.duration_s }, ...R83_CYCLES, ...US_CYCLES].find((c) => Math.abs(c.duration_s - duration) === 1);
  if (near)
    return { match: null, label: `not a published cycle: ${speed_kmh.length} samples; ${near.name} has ${near.duration_s + 1} (0 to ${near.duration_s} s at 1 Hz), check the first and last rows`, checks: [] };
  const known = [`${WLTC_3B.name} ${WLTC_3B.duration_s} s`, ...R83_CYCLES.map((r) => `${r.name} ${r.duration_s} s`), ...US_CYCLES.map((u) => `${u.name} ${u.duration_s} s`)];
  return { match: null, label: `not a published cycle: its ${fmt(duration)} s duration matches none of ${known.join(", ")}`, checks: [] };
}

