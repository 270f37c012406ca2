/**
 * Limits applied to every upload. Each says where it comes from.
 */

/** Largest accepted file: 5 MiB holds a 1 Hz cycle of several days or a 10 Hz log of hours (our choice). */
export const MAX_UPLOAD_BYTES = 5 * 1024 * 1024;

/** Same sample limit as the scenario rules of lib/engine (2,000,001 speed samples). */
export const MAX_CYCLE_SAMPLES = 2_000_001;

/** A cycle needs at least two samples (one interval), as the scenario rules require. */
export const MIN_CYCLE_ROWS = 2;

/**
 * Highest plausible road-vehicle speed in a drive cycle: 250 km/h, the usual electronic
 * limit of fast production cars (common practice, no source). Regulatory cycles stay
 * below 132 km/h (WLTC class 3b max 131.3 km/h, REFERENCES.md).
 */
export const MAX_SPEED_KMH = 250;

/**
 * Largest plausible |acceleration| between two rows: 6 m/s². The regulatory cycles stay
 * below 4 m/s² (US06 ≈ 3.8 m/s², from memory); only emergency stops exceed it (common
 * practice, no source). Anything above is most likely a unit or time-column mistake.
 */
export const MAX_ACCEL_M_S2 = 6;

/** Steepest plausible road grade: 40 % (common practice, no source; public roads rarely exceed 25 %). */
export const MAX_GRADE_PCT = 40;

/** Full-load curve plausibility: road engines turn below 20,000 rpm and give under 5,000 N·m (common practice, no source). */
export const MAX_ENGINE_SPEED_RPM = 20_000;
export const MAX_ENGINE_TORQUE_NM = 5_000;

/** Traction packs stay below 1,500 V (common practice, no source; 1,500 V DC is the low-voltage directive ceiling). */
export const MAX_PACK_VOLTAGE_V = 1_500;

/** At most this many problems are listed; the rest are counted. */
export const MAX_LISTED_ISSUES = 50;
