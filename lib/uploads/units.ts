/**
 * Units and roles read from column headers such as "speed [km/h]", "v_mph",
 * "Speed (m/s)", "time_s", "t [min]", "grade %", "Torque (N·m)", "SOC [%]".
 */
export type TimeUnit = "s" | "ms" | "min" | "h";
export type SpeedUnit = "km/h" | "m/s" | "mph";
export type EngineSpeedUnit = "rpm" | "rad/s";
export type SocUnit = "fraction" | "%";

export const TIME_UNITS: readonly TimeUnit[] = ["s", "ms", "min", "h"];
export const SPEED_UNITS: readonly SpeedUnit[] = ["km/h", "m/s", "mph"];
export const ENGINE_SPEED_UNITS: readonly EngineSpeedUnit[] = ["rpm", "rad/s"];
export const SOC_UNITS: readonly SocUnit[] = ["fraction", "%"];

/** Seconds per unit. */
export const SECONDS_PER: Record<TimeUnit, number> = { s: 1, ms: 0.001, min: 60, h: 3600 };
/** km/h per unit; 1 mile = 1609.344 m exactly (international yard and pound agreement, 1959). */
export const KMH_PER: Record<SpeedUnit, number> = { "km/h": 1, "m/s": 3.6, mph: 1.609344 };

/** A header split into its name and the unit text it carries (brackets, parentheses, suffix). */
export interface SplitHeader {
  name: string;
  unit: string | null;
}

const norm = (s: string) => s.toLowerCase().replace(/\s+/g, "").replace(/·|\*/g, "");

export function splitHeader(header: string): SplitHeader {
  const h = header.trim();
  const bracket = h.match(/^(.*?)[\s_]*[[(]\s*([^\])]*?)\s*[\])]\s*$/);
  if (bracket) return { name: bracket[1].trim(), unit: bracket[2] };
  const inForm = h.match(/^(.*?)\s+in\s+(\S+)$/i);
  if (inForm) return { name: inForm[1].trim(), unit: inForm[2] };
  const pct = h.match(/^(.*?)\s*%$/);
  if (pct && pct[1] !== "") return { name: pct[1].trim(), unit: "%" };
  const suffix = h.match(/^(.+?)[_\s]+([^_\s]+)$/);
  if (suffix && unitWord(suffix[2])) return { name: suffix[1].trim(), unit: suffix[2] };
  return { name: h, unit: null };
}

const UNIT_WORDS = new Set(["s", "sec", "secs", "seconds", "ms", "min", "mins", "minutes", "h", "hr", "hours", "kmh", "km/h", "kph", "kmph", "mps", "m/s", "mph", "pct", "percent", "%", "rpm", "nm", "n.m", "n-m", "v", "volt", "volts", "rad/s", "1/min"]);
const unitWord = (u: string) => UNIT_WORDS.has(norm(u));

export function timeUnitOf(unit: string): TimeUnit | null {
  const u = norm(unit);
  if (["s", "sec", "secs", "second", "seconds"].includes(u)) return "s";
  if (["ms", "msec", "millisecond", "milliseconds"].includes(u)) return "ms";
  if (["min", "mins", "minute", "minutes"].includes(u)) return "min";
  if (["h", "hr", "hrs", "hour", "hours"].includes(u)) return "h";
  return null;
}

export function speedUnitOf(unit: string): SpeedUnit | null {
  const u = norm(unit);
  if (["km/h", "kmh", "kph", "kmph", "km/hr", "kmh-1", "kmh^-1"].includes(u)) return "km/h";
  // in a speed column "ms" is metres per second: "v_ms"
  if (["m/s", "mps", "ms", "ms-1", "ms^-1", "m/sec"].includes(u)) return "m/s";
  if (["mph", "mi/h", "mi/hr", "miles/h"].includes(u)) return "mph";
  return null;
}

export function engineSpeedUnitOf(unit: string): EngineSpeedUnit | null {
  const u = norm(unit);
  if (["rpm", "1/min", "min-1", "min^-1", "r/min", "rev/min"].includes(u)) return "rpm";
  if (["rad/s", "rads", "rads-1"].includes(u)) return "rad/s";
  return null;
}

export const isTorqueUnit = (unit: string) => ["nm", "n.m", "n-m", "newtonmetre", "newtonmeter"].includes(norm(unit));
export const isVoltUnit = (unit: string) => ["v", "volt", "volts"].includes(norm(unit));
export const isPercentUnit = (unit: string) => ["%", "pct", "percent"].includes(norm(unit));
export const isFractionUnit = (unit: string) => ["-", "1", "fraction", "frac", "0-1", "p.u.", "pu"].includes(norm(unit));

/** Role guesses from the header name (unit part removed). */
export const ROLE_PATTERNS = {
  time: /^(t|time|times|zeit|timestamp|elapsed|elapsed.?time|sec|seconds|test.?time)$|^time\b/i,
  speed: /speed|velocity|^v$|^vel\b|^vveh|^v.?veh|^geschwindigkeit/i,
  grade: /grade|slope|gradient|incline|steigung/i,
  engine_speed: /speed|^n$|^n.?eng|rpm|revs|drehzahl/i,
  torque: /torque|^t$|^trq|^tq|moment|drehmoment/i,
  soc: /^soc$|state.?of.?charge|^soc\b/i,
  voltage: /ocv|voltage|^u$|^v$|^u.?oc|^v.?oc|spannung/i,
} as const;
