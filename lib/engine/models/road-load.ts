/**
 * Road load of one interval (DESIGN §4): F = m(1+f)·a + ½ρ·c_d·A·v̄² + c_r·m·g·cos α·[moving]
 * + m·g·sin α, and F = 0 at standstill. Returned as powers F_i·v̄ so the ledger can book
 * each term; their sum is the wheel power.
 */
export interface RoadLoadParams {
  mass_kg: number;
  inertial_mass_kg: number; // mass_kg · (1 + rotating_mass_factor)
  drag_area_m2: number; // c_d · A
  air_density_kg_m3: number;
  rolling_resistance: number;
  gravity_m_s2: number;
}

export interface RoadLoadPowers {
  aero_w: number;
  rolling_w: number;
  grade_w: number;
  inertia_w: number;
}

export function roadLoadForce_n(p: RoadLoadParams, vbar_m_s: number, a_m_s2: number, grade_rad: number): number {
  if (vbar_m_s <= 0) return 0;
  return (
    p.inertial_mass_kg * a_m_s2 +
    0.5 * p.air_density_kg_m3 * p.drag_area_m2 * vbar_m_s * vbar_m_s +
    p.rolling_resistance * p.mass_kg * p.gravity_m_s2 * Math.cos(grade_rad) +
    p.mass_kg * p.gravity_m_s2 * Math.sin(grade_rad)
  );
}

/** Writes the four road-load powers of one interval into `out` (no allocation). */
export function roadLoadPowers(p: RoadLoadParams, vbar_m_s: number, a_m_s2: number, grade_rad: number, out: RoadLoadPowers): void {
  if (vbar_m_s <= 0) {
    out.aero_w = 0;
    out.rolling_w = 0;
    out.grade_w = 0;
    out.inertia_w = 0;
    return;
  }
  const mg = p.mass_kg * p.gravity_m_s2;
  out.aero_w = 0.5 * p.air_density_kg_m3 * p.drag_area_m2 * vbar_m_s * vbar_m_s * vbar_m_s;
  out.rolling_w = p.rolling_resistance * mg * (grade_rad === 0 ? 1 : Math.cos(grade_rad)) * vbar_m_s;
  out.grade_w = grade_rad === 0 ? 0 : mg * Math.sin(grade_rad) * vbar_m_s;
  out.inertia_w = p.inertial_mass_kg * a_m_s2 * vbar_m_s;
}
