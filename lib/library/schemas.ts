import { z } from "zod";
import { MAX_UPLOAD_BYTES } from "@/lib/uploads";
import { LIBRARY_KINDS } from "./kinds";

const kind = z.enum(LIBRARY_KINDS, { error: `choose a kind: ${LIBRARY_KINDS.join(", ")}` });
// characters ≤ bytes for UTF-8; the byte limit itself is checked by lib/uploads with a line-free message
const text = z.string({ error: "send the file's text" }).max(MAX_UPLOAD_BYTES, `the file is larger than ${MAX_UPLOAD_BYTES / 1048576} MiB`);

export const previewRequestSchema = z.strictObject({
  kind,
  text,
  confirmation: z.unknown().optional(),
});

export const saveRequestSchema = z.strictObject({
  kind,
  text,
  confirmation: z.unknown(),
  name: z.string({ error: "give the item a name" }).trim().min(1, "give the item a name").max(120, "a name has at most 120 characters"),
  source_note: z.string().trim().max(1000, "a source note has at most 1000 characters").default(""),
  file_name: z.string().trim().max(255).optional(),
});
export type SaveRequest = z.output<typeof saveRequestSchema>;
