import type { Quantity } from "./dimensions";

/**
 * A unit: canonical symbol, quantity, and the factor that turns a value in it into SI.
 * Factors that are a ratio ("km/h" = 1000/3600, "%" = 1/100) keep the divisor apart, so
 * 95 % becomes 95/100 = 0.95 rather than 95 × 0.01 = 0.9500000000000001.
 */
export interface UnitDef {
  symbol: string;
  quantity: Quantity;
  /** value_si = value × to_si / per */
  to_si: number;
  per?: number;
  aliases?: readonly string[];
}

const TWO_PI = 2 * Math.PI;

// Conversion factors: exact by definition (SI brochure, 9th ed.; NIST SP 811 appendix B)
// except where noted.
export const UNITS: readonly UnitDef[] = [
  { symbol: "", quantity: "ratio", to_si: 1 },
  { symbol: "%", quantity: "ratio", to_si: 1, per: 100, aliases: ["percent", "pct"] },
  { symbol: "C", quantity: "c_rate", to_si: 1 },
  // length, area, volume
  { symbol: "m", quantity: "length", to_si: 1 },
  { symbol: "mm", quantity: "length", to_si: 1, per: 1000 },
  { symbol: "cm", quantity: "length", to_si: 1, per: 100 },
  { symbol: "km", quantity: "length", to_si: 1e3 },
  { symbol: "m²", quantity: "area", to_si: 1, aliases: ["m^2", "m2", "sqm"] },
  { symbol: "cm²", quantity: "area", to_si: 1, per: 1e4, aliases: ["cm^2", "cm2"] },
  { symbol: "L", quantity: "volume", to_si: 1, per: 1000, aliases: ["l", "litre", "liter", "dm³", "dm^3"] },
  { symbol: "cm³", quantity: "volume", to_si: 1, per: 1e6, aliases: ["cm^3", "cc", "ccm"] },
  { symbol: "m³", quantity: "volume", to_si: 1, aliases: ["m^3", "m3"] },
  // mass, time
  { symbol: "kg", quantity: "mass", to_si: 1 },
  { symbol: "g", quantity: "mass", to_si: 1, per: 1000 },
  { symbol: "t", quantity: "mass", to_si: 1e3, aliases: ["tonne"] },
  { symbol: "s", quantity: "time", to_si: 1, aliases: ["sec"] },
  { symbol: "min", quantity: "time", to_si: 60 },
  { symbol: "h", quantity: "time", to_si: 3600, aliases: ["hr"] },
  // kinematics
  { symbol: "m/s", quantity: "speed", to_si: 1 },
  { symbol: "km/h", quantity: "speed", to_si: 1000, per: 3600, aliases: ["kph", "kmh", "km/hr"] },
  // international mile = 1609.344 m (exact, 1959 agreement)
  { symbol: "mph", quantity: "speed", to_si: 1609.344, per: 3600, aliases: ["mi/h"] },
  { symbol: "m/s²", quantity: "acceleration", to_si: 1, aliases: ["m/s^2", "m/s2"] },
  { symbol: "rad/s", quantity: "angular_speed", to_si: 1 },
  { symbol: "rpm", quantity: "angular_speed", to_si: TWO_PI, per: 60, aliases: ["r/min", "1/min"] },
  // mechanics
  { symbol: "N", quantity: "force", to_si: 1 },
  { symbol: "kN", quantity: "force", to_si: 1e3 },
  { symbol: "N·m", quantity: "torque", to_si: 1, aliases: ["Nm"] },
  { symbol: "kN·m", quantity: "torque", to_si: 1e3, aliases: ["kNm"] },
  { symbol: "J", quantity: "energy", to_si: 1 },
  { symbol: "kJ", quantity: "energy", to_si: 1e3 },
  { symbol: "MJ", quantity: "energy", to_si: 1e6 },
  { symbol: "Wh", quantity: "energy", to_si: 3600 },
  { symbol: "kWh", quantity: "energy", to_si: 3.6e6 },
  { symbol: "W", quantity: "power", to_si: 1 },
  { symbol: "kW", quantity: "power", to_si: 1e3 },
  { symbol: "MW", quantity: "power", to_si: 1e6 },
  // mechanical horsepower = 550 ft·lbf/s = 745.69987158227022 W (NIST SP 811, B.8)
  { symbol: "hp", quantity: "power", to_si: 745.69987158227022 },
  // metric horsepower = 75 kgf·m/s = 735.49875 W (NIST SP 811, B.8)
  { symbol: "PS", quantity: "power", to_si: 735.49875 },
  { symbol: "Pa", quantity: "pressure", to_si: 1 },
  { symbol: "kPa", quantity: "pressure", to_si: 1e3 },
  { symbol: "MPa", quantity: "pressure", to_si: 1e6 },
  { symbol: "bar", quantity: "pressure", to_si: 1e5 },
  { symbol: "kg/m³", quantity: "density", to_si: 1, aliases: ["kg/m^3", "kg/m3"] },
  { symbol: "kg/L", quantity: "density", to_si: 1e3, aliases: ["kg/l", "g/cm³", "g/cm^3", "g/cc"] },
  { symbol: "g/L", quantity: "density", to_si: 1, aliases: ["g/l"] },
  { symbol: "MJ/kg", quantity: "specific_energy", to_si: 1e6 },
  { symbol: "kJ/kg", quantity: "specific_energy", to_si: 1e3 },
  { symbol: "kWh/kg", quantity: "specific_energy", to_si: 3.6e6 },
  { symbol: "g/kWh", quantity: "specific_fuel", to_si: 1, per: 3.6e9 },
  // electrics
  { symbol: "A", quantity: "current", to_si: 1 },
  { symbol: "Ah", quantity: "charge", to_si: 3600, aliases: ["A·h"] },
  { symbol: "mAh", quantity: "charge", to_si: 3600, per: 1000 },
  { symbol: "V", quantity: "voltage", to_si: 1 },
  { symbol: "Ω", quantity: "resistance", to_si: 1, aliases: ["ohm", "Ohm", "ohms"] },
  { symbol: "mΩ", quantity: "resistance", to_si: 1, per: 1000, aliases: ["mohm", "mOhm", "milliohm"] },
];
