/**
 * The mean speed reaches us as km/h → m/s → mean → km/h, which can land a rounding unit
 * below the km/h figure the user wrote (a steady 61 km/h comes back as 60.99999999999999).
 * A threshold counts as reached within this relative tolerance, far below any physical speed.
 */
const ROUNDING = 1e-12;

/** Speed-scheduled gear (DESIGN §3): gear = 1 + count(mean speed ≥ threshold). */
export function scheduledGear(speed_kmh: number, upshift_speeds_kmh: ArrayLike<number>): number {
  let gear = 1;
  for (let i = 0; i < upshift_speeds_kmh.length; i++) if (speed_kmh >= upshift_speeds_kmh[i] * (1 - ROUNDING)) gear++;
  return gear;
}
