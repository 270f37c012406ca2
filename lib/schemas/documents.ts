// Schemas of the documents API (forms and route handlers share them).
import { z } from "zod";
import type { Kpi } from "@/lib/engine/result";
import { POWERTRAINS } from "@/lib/notebook/block-kinds";

export const documentNameField = z
  .string({ error: "enter a document name" })
  .trim()
  .min(1, "enter a document name")
  .max(120, "a document name has at most 120 characters");

export const powertrainField = z.enum(POWERTRAINS, { error: "choose one of conventional, bev, parallel, series" });

export const createDocumentSchema = z.object({ name: documentNameField, powertrain: powertrainField });
export type CreateDocumentInput = z.input<typeof createDocumentSchema>;

export const renameDocumentSchema = z.object({ name: documentNameField });
export type RenameDocumentInput = z.input<typeof renameDocumentSchema>;

/** PATCH /documents/:d — rename and/or archive in one call; at least one field. */
export const patchDocumentSchema = z
  .object({ name: documentNameField.optional(), archived: z.boolean({ error: "archived is true or false" }).optional() })
  .refine((v) => v.name !== undefined || v.archived !== undefined, { message: "send a name or archived", path: ["name"] });
export type PatchDocumentInput = z.input<typeof patchDocumentSchema>;

export const duplicateDocumentSchema = z.object({ name: documentNameField.optional() });

/** The numeric headline figures of Result v1 that the documents table can show and sort by. */
export const SUMMARY_KPI_KEYS = [
  "distance_km", "duration_s", "fuel_g", "fuel_l", "fuel_l_per_100km", "co2_g_per_km", "battery_net_kwh",
  "electric_kwh_per_100km", "soc_initial", "soc_final", "infeasible_steps", "engine_starts", "max_c_rate",
] as const satisfies readonly (keyof Kpi)[];
export type SummaryKpiKey = (typeof SUMMARY_KPI_KEYS)[number];

const finiteOrNull = z.number({ error: "expected a number or null" }).finite("expected a finite number").nullable().optional();
const kpiShape = Object.fromEntries(SUMMARY_KPI_KEYS.map((k) => [k, finiteOrNull])) as Record<SummaryKpiKey, typeof finiteOrNull>;

/** PUT /documents/:d/summary — the headline figures the UI computed last. Unknown keys are refused. */
export const documentSummarySchema = z.object({
  kpi: z.strictObject({ ...kpiShape, feasible: z.boolean({ error: "feasible is true or false" }).optional() }),
  computedAt: z.iso.datetime({ error: "computedAt is an ISO 8601 date-time" }).optional(),
});
export type DocumentSummaryInput = z.input<typeof documentSummarySchema>;

const SORTS = ["name", "updated", "powertrain", "kpi"] as const;

/** Query string of GET /documents. */
export const listDocumentsQuerySchema = z.object({
  q: z.string().trim().max(100, "the search text has at most 100 characters").optional(),
  sort: z.enum(SORTS, { error: "sort is one of name, updated, powertrain, kpi" }).default("updated"),
  dir: z.enum(["asc", "desc"], { error: "dir is asc or desc" }).optional(),
  archived: z.enum(["0", "1"], { error: "archived is 0 or 1" }).default("0"),
  kpi: z.enum(SUMMARY_KPI_KEYS, { error: `kpi is one of ${SUMMARY_KPI_KEYS.join(", ")}` }).default("fuel_l_per_100km"),
});
export type ListDocumentsQuery = z.output<typeof listDocumentsQuerySchema>;
