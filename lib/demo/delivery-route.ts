/**
 * "Harbour district parcel round": a fictional multi-drop urban delivery route, invented for
 * the demo. The van leaves the depot, crosses town on an arterial road with traffic lights,
 * takes a short ring-road stretch, works a delivery district drop by drop, and comes back.
 *
 * The route is a list of phases (accelerate / cruise / decelerate / dwell) with stated
 * accelerations; `sampleRoute` turns it into 1 Hz speed samples. Every phase must end on a
 * whole second, so the samples' trapezoid distance equals the exact integral of the phases.
 * Speeds are multiples of 9 km/h (2.5 m/s) so that round accelerations give whole seconds.
 * Drop dwells are short doorstep hand-overs with the engine kept running; longer drops, where
 * drivers switch off, are left out of the cycle (the model would idle the engine throughout).
 */

export type Phase =
  | { kind: "accelerate"; to_kmh: number; a_m_s2: number }
  | { kind: "cruise"; duration_s: number }
  /** a_m_s2 is the magnitude of the deceleration (positive) */
  | { kind: "decelerate"; to_kmh: number; a_m_s2: number }
  | { kind: "dwell"; duration_s: number };

export interface Section {
  label: string;
  phases: Phase[];
}

const accelerate = (to_kmh: number, a_m_s2: number): Phase => ({ kind: "accelerate", to_kmh, a_m_s2 });
const decelerate = (to_kmh: number, a_m_s2: number): Phase => ({ kind: "decelerate", to_kmh, a_m_s2 });
const cruise = (duration_s: number): Phase => ({ kind: "cruise", duration_s });
const dwell = (duration_s: number): Phase => ({ kind: "dwell", duration_s });

// Launch and stop rates of a loaded van in town (invented for the demo, common practice, no source).
const LAUNCH_27 = accelerate(27, 0.75); // 10 s
const LAUNCH_36 = accelerate(36, 1.0); // 10 s
const LAUNCH_45 = accelerate(45, 0.625); // 20 s
const STOP = 1.25; // m/s², a firm but ordinary stop

/** Start from rest, hold `kmh` for `cruise_s`, stop, stand for `stand_s`. */
function hop(kmh: 27 | 36 | 45, cruise_s: number, stand_s: number): Phase[] {
  const launch = kmh === 27 ? LAUNCH_27 : kmh === 36 ? LAUNCH_36 : LAUNCH_45;
  return [launch, cruise(cruise_s), decelerate(0, STOP), dwell(stand_s)];
}

/** One drop: a junction stop on the way (when `junction_s` > 0), then the doorstep dwell. */
function drop(kmh: 27 | 36, first_s: number, junction_s: number, second_s: number, doorstep_s: number): Phase[] {
  if (junction_s === 0) return hop(kmh, first_s + second_s, doorstep_s);
  return [...hop(kmh, first_s, junction_s), ...hop(27, second_s, doorstep_s)];
}

const RING_ROAD_ON: Phase[] = [LAUNCH_45, accelerate(72, 0.5), accelerate(81, 0.25)];
const RING_ROAD_OFF: Phase[] = [decelerate(54, 0.625), cruise(20), decelerate(0, STOP)];

export const DELIVERY_ROUTE: readonly Section[] = [
  { label: "depot yard and gate", phases: [dwell(20), accelerate(18, 1.25), cruise(15), decelerate(0, STOP), dwell(10)] },
  { label: "arterial road out, three traffic lights", phases: [...hop(45, 45, 25), ...hop(45, 30, 30), ...hop(45, 60, 20)] },
  { label: "ring road, two junctions at 81 km/h", phases: [...RING_ROAD_ON, cruise(100), ...RING_ROAD_OFF, dwell(15)] },
  {
    label: "delivery district, twelve drops",
    phases: [
      ...drop(36, 20, 12, 15, 40), ...drop(27, 25, 0, 10, 45), ...drop(27, 12, 8, 18, 35), ...drop(36, 30, 0, 15, 50),
      ...drop(27, 15, 15, 10, 40), ...drop(27, 20, 0, 5, 30), ...drop(36, 25, 10, 20, 45), ...drop(27, 10, 0, 12, 40),
      ...drop(27, 18, 6, 12, 35), ...drop(36, 35, 0, 0, 50), ...drop(27, 14, 10, 14, 40), ...drop(27, 22, 0, 8, 45),
    ],
  },
  { label: "ring road back", phases: [...RING_ROAD_ON, cruise(80), ...RING_ROAD_OFF, dwell(25)] },
  { label: "arterial road back, two traffic lights", phases: [...hop(45, 50, 30), ...hop(45, 40, 20)] },
  { label: "into the depot", phases: [accelerate(18, 1.25), cruise(20), decelerate(0, STOP), dwell(15)] },
];

export interface SampledRoute {
  dt_s: number;
  /** one speed per time step from t = 0, km/h */
  speed_kmh: number[];
}

const KMH_PER_M_S = 3.6;

/** Whole steps a phase lasts; a ramp that does not end on a step boundary is refused. */
function rampSteps(from_kmh: number, p: Phase & { to_kmh: number; a_m_s2: number }, where: string, dt_s: number): number {
  const rising = p.kind === "accelerate";
  if (!(p.a_m_s2 > 0)) throw new Error(`${where}: acceleration must be a positive number (got ${p.a_m_s2})`);
  if (rising ? !(p.to_kmh > from_kmh) : !(p.to_kmh < from_kmh))
    throw new Error(`${where}: ${p.kind} from ${from_kmh} km/h to ${p.to_kmh} km/h goes the wrong way`);
  const steps = Math.abs(p.to_kmh - from_kmh) / KMH_PER_M_S / p.a_m_s2 / dt_s;
  const whole = Math.round(steps);
  if (Math.abs(steps - whole) > 1e-9)
    throw new Error(`${where}: ${from_kmh}→${p.to_kmh} km/h at ${p.a_m_s2} m/s² lasts ${steps * dt_s} s, not a whole number of ${dt_s} s steps`);
  return whole;
}

function holdSteps(p: { duration_s: number }, where: string, dt_s: number): number {
  const steps = p.duration_s / dt_s;
  if (!(steps > 0) || !Number.isInteger(steps)) throw new Error(`${where}: duration ${p.duration_s} s is not a positive whole number of ${dt_s} s steps`);
  return steps;
}

// Keeps the list text short and free of binary noise (46.800000000000004 → 46.8).
const tidy = (x: number): number => Number(x.toFixed(9));

/** Samples the route (default 1 Hz). Throws a message naming the section and phase that is wrong. */
export function sampleRoute(route: readonly Section[] = DELIVERY_ROUTE, dt_s = 1): SampledRoute {
  const speed_kmh = [0];
  let v = 0;
  route.forEach((section, si) =>
    section.phases.forEach((p, pi) => {
      const where = `route section ${si + 1} (${section.label}), phase ${pi + 1} (${p.kind})`;
      if (p.kind === "dwell") {
        if (v !== 0) throw new Error(`${where}: a dwell needs the van at rest (it is at ${v} km/h)`);
        for (let i = 0, n = holdSteps(p, where, dt_s); i < n; i++) speed_kmh.push(0);
      } else if (p.kind === "cruise") {
        if (v === 0) throw new Error(`${where}: cruise at 0 km/h; use a dwell`);
        for (let i = 0, n = holdSteps(p, where, dt_s); i < n; i++) speed_kmh.push(v);
      } else {
        const n = rampSteps(v, p, where, dt_s);
        for (let i = 1; i < n; i++) speed_kmh.push(tidy(v + ((p.to_kmh - v) * i) / n));
        speed_kmh.push(p.to_kmh);
        v = p.to_kmh;
      }
    }),
  );
  if (v !== 0) throw new Error(`the route ends at ${v} km/h; it must end at rest`);
  return { dt_s, speed_kmh };
}

/** The speeds as list text for the drive cycle block: one line per minute of samples. */
export function routeSpeedsText(route: SampledRoute): string {
  const perLine = Math.max(1, Math.round(60 / route.dt_s));
  const lines: string[] = [];
  for (let i = 0; i < route.speed_kmh.length; i += perLine) lines.push(route.speed_kmh.slice(i, i + perLine).join(", "));
  return lines.join(",\n");
}

/** Figures for notes: duration, distance (trapezoid of the samples), stops, top speed. */
export function routeFigures(route: SampledRoute): { duration_s: number; distance_km: number; stops: number; max_kmh: number; mean_kmh: number } {
  const v = route.speed_kmh;
  let distance_m = 0, stops = 0;
  for (let k = 0; k + 1 < v.length; k++) {
    distance_m += ((v[k] + v[k + 1]) / 2 / KMH_PER_M_S) * route.dt_s;
    if (v[k] > 0 && v[k + 1] === 0) stops++;
  }
  const duration_s = (v.length - 1) * route.dt_s;
  return { duration_s, distance_km: distance_m / 1000, stops, max_kmh: Math.max(...v), mean_kmh: distance_m / 1000 / (duration_s / 3600) };
}
