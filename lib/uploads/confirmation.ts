import { z } from "zod";

/** What the user confirms about the file's layout (shared by every upload kind). */
export const layoutConfirmationSchema = z.strictObject({
  delimiter: z.enum([",", ";", "\t", "|"]),
  decimal: z.enum([".", ","]),
  header_rows: z.union([z.literal(0), z.literal(1), z.literal(2)]),
});

const column = z.number().int().min(1).max(1000);
const step = z.number().positive().max(3600);

export const cycleConfirmationSchema = layoutConfirmationSchema.extend({
  time: z.strictObject({ column, unit: z.enum(["s", "ms", "min", "h"]) }).nullable(),
  speed: z.strictObject({ column, unit: z.enum(["km/h", "m/s", "mph"]) }),
  grade: z.strictObject({ column }).nullable(),
  /** Row spacing when there is no time column. */
  sample_dt_s: step.nullable().default(null),
  /** Output step; null: the median spacing of the rows. */
  dt_s: step.nullable().default(null),
});
export type CycleConfirmation = z.output<typeof cycleConfirmationSchema>;

export const fullLoadConfirmationSchema = layoutConfirmationSchema.extend({
  speed: z.strictObject({ column, unit: z.enum(["rpm", "rad/s"]) }),
  torque: z.strictObject({ column }),
});
export type FullLoadConfirmation = z.output<typeof fullLoadConfirmationSchema>;

export const ocvConfirmationSchema = layoutConfirmationSchema.extend({
  soc: z.strictObject({ column, unit: z.enum(["fraction", "%"]) }),
  voltage: z.strictObject({ column }),
});
export type OcvConfirmation = z.output<typeof ocvConfirmationSchema>;
