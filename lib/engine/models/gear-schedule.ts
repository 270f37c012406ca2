/** Speed-scheduled gear (DESIGN §3): gear = 1 + count(mean speed ≥ threshold). */
export function scheduledGear(speed_kmh: number, upshift_speeds_kmh: ArrayLike<number>): number {
  let gear = 1;
  for (let i = 0; i < upshift_speeds_kmh.length; i++) if (speed_kmh >= upshift_speeds_kmh[i]) gear++;
  return gear;
}
