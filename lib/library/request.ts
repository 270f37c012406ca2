// Upload requests come as JSON ({kind, text, confirmation}) or as multipart/form-data with a
// `file` part (fields kind, confirmation as JSON text, name, source_note). Both end as the same
// object; a file part keeps its raw bytes so that the encoding check sees them.
import { MAX_UPLOAD_BYTES } from "@/lib/uploads";
import { HttpError, UnsupportedMediaType } from "@/lib/http/errors";
import { isJsonContentType, readJsonBody, readLimitedBytes } from "@/lib/http/body";

/** Room for the JSON escaping of a file at the upload limit plus the other fields. */
export const UPLOAD_REQUEST_LIMIT_BYTES = 2 * MAX_UPLOAD_BYTES + 64 * 1024;

export type UploadRequest = { fields: Record<string, unknown>; bytes: Uint8Array | null };

function parseJsonField(name: string, value: string): unknown {
  try {
    return JSON.parse(value);
  } catch {
    throw new HttpError(400, `the form field "${name}" is not valid JSON`);
  }
}

export async function readUploadRequest(request: Request): Promise<UploadRequest> {
  const type = request.headers.get("content-type");
  if (isJsonContentType(type)) {
    const body = await readJsonBody(request, UPLOAD_REQUEST_LIMIT_BYTES);
    if (!body || typeof body !== "object" || Array.isArray(body)) throw new HttpError(400, "send a JSON object");
    return { fields: body as Record<string, unknown>, bytes: null };
  }
  if (!type || !type.toLowerCase().startsWith("multipart/form-data")) throw new UnsupportedMediaType();
  const raw = await readLimitedBytes(request, UPLOAD_REQUEST_LIMIT_BYTES);
  let form: FormData;
  try {
    form = await new Response(raw, { headers: { "content-type": type } }).formData();
  } catch {
    throw new HttpError(400, "the multipart body could not be read");
  }
  const fields: Record<string, unknown> = {};
  let bytes: Uint8Array | null = null;
  for (const [key, value] of form.entries()) {
    if (typeof value === "string") fields[key] = key === "confirmation" && value !== "" ? parseJsonField(key, value) : value;
    else if (key === "file") {
      bytes = new Uint8Array(await value.arrayBuffer());
      fields.file_name ??= value.name;
    }
  }
  if (!bytes) throw new HttpError(400, 'the form has no "file" part');
  fields.text ??= "";
  return { fields, bytes };
}
