// One entry point for every kind of upload: validates the user's confirmation, runs the pure
// upload pipeline of lib/uploads and shapes the answer the API and the UI share.
import type { z } from "zod";
import {
  cycleConfirmationSchema, fullLoadConfirmationSchema, ocvConfirmationSchema,
  previewCycle, previewFullLoad, previewOcv, type UploadInput, type UploadIssue,
} from "@/lib/uploads";
import { MAX_LIBRARY_CYCLE_SAMPLES, type LibraryKind } from "./kinds";
import { summarize, type LibrarySummary } from "./summary";

export type LibraryData =
  | { dt_s: number; speed_kmh: number[]; grade_pct?: number[] }
  | { speed_rpm: number[]; torque_nm: number[] }
  | { soc: number[]; voltage_v: number[] };

export type UploadPreview =
  | { ok: true; kind: LibraryKind; proposal: unknown; confirmation: unknown; data: LibraryData; summary: LibrarySummary; warnings: string[] }
  | { ok: false; kind: LibraryKind; proposal: unknown; confirmation: unknown; issues: UploadIssue[] };

const SCHEMAS: Record<LibraryKind, z.ZodType> = {
  cycle: cycleConfirmationSchema,
  engine_full_load: fullLoadConfirmationSchema,
  battery_ocv: ocvConfirmationSchema,
};

function confirmationIssues(kind: LibraryKind, raw: unknown): { value?: unknown; issues?: UploadIssue[] } {
  if (raw === undefined || raw === null) return {};
  const parsed = SCHEMAS[kind].safeParse(raw);
  if (parsed.success) return { value: parsed.data };
  return {
    issues: parsed.error.issues.map((i) => ({
      line: null, column: null, column_name: null, message: `confirmation ${i.path.map(String).join(".") || "(whole)"}: ${i.message}`,
    })),
  };
}

function run(kind: LibraryKind, input: UploadInput, confirmation: unknown) {
  if (kind === "cycle") {
    const r = previewCycle(input, confirmation as z.output<typeof cycleConfirmationSchema> | undefined);
    if (!r.ok) return r;
    if (r.cycle.speed_kmh.length > MAX_LIBRARY_CYCLE_SAMPLES)
      return { ...r, ok: false as const, issues: [{ line: null, column: null, column_name: null, message: `the resampled cycle has ${r.cycle.speed_kmh.length} samples; the library keeps at most ${MAX_LIBRARY_CYCLE_SAMPLES} (choose a larger step)` }] };
    const { dt_s, speed_kmh, grade_pct } = r.cycle;
    return { ...r, data: grade_pct ? { dt_s, speed_kmh, grade_pct } : { dt_s, speed_kmh } };
  }
  if (kind === "engine_full_load") return previewFullLoad(input, confirmation as z.output<typeof fullLoadConfirmationSchema> | undefined);
  return previewOcv(input, confirmation as z.output<typeof ocvConfirmationSchema> | undefined);
}

/** Proposal + validated data + summary; nothing is stored here. */
export function previewUpload(kind: LibraryKind, input: UploadInput, rawConfirmation?: unknown): UploadPreview {
  const conf = confirmationIssues(kind, rawConfirmation);
  if (conf.issues) return { ok: false, kind, proposal: null, confirmation: rawConfirmation, issues: conf.issues };
  const r = run(kind, input, conf.value);
  if (!r.ok) return { ok: false, kind, proposal: r.proposal, confirmation: r.confirmation, issues: r.issues };
  const data = r.data as LibraryData;
  return { ok: true, kind, proposal: r.proposal, confirmation: r.confirmation, data, summary: summarize(kind, data), warnings: r.warnings };
}
