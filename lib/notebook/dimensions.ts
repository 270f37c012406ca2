/**
 * Physical dimensions as exponent vectors over the SI base units we need:
 * metre, kilogram, second, ampere. Angles are treated as dimensionless (as in SI),
 * so rad/s and rpm are "1/s".
 */
export type Dimension = readonly [m: number, kg: number, s: number, A: number];

export const DIMENSIONLESS: Dimension = [0, 0, 0, 0];

/** Named quantities. Some share a dimension (torque and energy, ratio and C-rate). */
export const QUANTITIES = {
  ratio: { label: "ratio", dim: [0, 0, 0, 0] },
  count: { label: "count", dim: [0, 0, 0, 0] },
  c_rate: { label: "C-rate", dim: [0, 0, 0, 0] },
  length: { label: "length", dim: [1, 0, 0, 0] },
  area: { label: "area", dim: [2, 0, 0, 0] },
  volume: { label: "volume", dim: [3, 0, 0, 0] },
  mass: { label: "mass", dim: [0, 1, 0, 0] },
  time: { label: "time", dim: [0, 0, 1, 0] },
  speed: { label: "speed", dim: [1, 0, -1, 0] },
  acceleration: { label: "acceleration", dim: [1, 0, -2, 0] },
  angular_speed: { label: "rotational speed", dim: [0, 0, -1, 0] },
  force: { label: "force", dim: [1, 1, -2, 0] },
  torque: { label: "torque", dim: [2, 1, -2, 0] },
  energy: { label: "energy", dim: [2, 1, -2, 0] },
  power: { label: "power", dim: [2, 1, -3, 0] },
  pressure: { label: "pressure", dim: [-1, 1, -2, 0] },
  density: { label: "density", dim: [-3, 1, 0, 0] },
  specific_energy: { label: "specific energy", dim: [2, 0, -2, 0] },
  specific_fuel: { label: "specific fuel consumption", dim: [-2, 0, 2, 0] },
  current: { label: "current", dim: [0, 0, 0, 1] },
  charge: { label: "charge", dim: [0, 0, 1, 1] },
  voltage: { label: "voltage", dim: [2, 1, -3, -1] },
  resistance: { label: "resistance", dim: [2, 1, -3, -2] },
} as const satisfies Record<string, { label: string; dim: Dimension }>;

export type Quantity = keyof typeof QUANTITIES;

export function dimensionOf(q: Quantity): Dimension {
  return QUANTITIES[q].dim;
}

export function sameDimension(a: Dimension, b: Dimension): boolean {
  return a.every((e, i) => Math.abs(e - b[i]) < 1e-12);
}

export function isDimensionless(d: Dimension): boolean {
  return sameDimension(d, DIMENSIONLESS);
}

export function multiplyDimensions(a: Dimension, b: Dimension, sign = 1): Dimension {
  return [a[0] + sign * b[0], a[1] + sign * b[1], a[2] + sign * b[2], a[3] + sign * b[3]];
}

export function powerDimension(a: Dimension, p: number): Dimension {
  return [a[0] * p, a[1] * p, a[2] * p, a[3] * p];
}

/** The quantity names whose dimension equals d, for messages ("energy or torque"). */
export function describeDimension(d: Dimension): string {
  if (isDimensionless(d)) return "a pure number";
  const names = (Object.keys(QUANTITIES) as Quantity[])
    .filter((q) => sameDimension(QUANTITIES[q].dim, d))
    .map((q) => QUANTITIES[q].label);
  if (names.length > 0) return names.join(" or ");
  const base = ["m", "kg", "s", "A"];
  const parts = d.map((e, i) => (e === 0 ? "" : e === 1 ? base[i] : `${base[i]}^${e}`)).filter(Boolean);
  return parts.join("·");
}
