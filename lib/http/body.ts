// Reads a request body with a byte cap, so an oversized body is refused without buffering it all.
import { HttpError, PayloadTooLarge, UnsupportedMediaType } from "./errors";

export const DEFAULT_BODY_LIMIT_BYTES = 64 * 1024;

export function isJsonContentType(value: string | null): boolean {
  if (!value) return false;
  const type = value.split(";")[0]?.trim().toLowerCase();
  return type === "application/json" || (type?.startsWith("application/") === true && type.endsWith("+json"));
}

/** The raw body bytes; 413 as soon as the declared or streamed size passes the limit. */
export async function readLimitedBytes(request: Request, limitBytes: number): Promise<Uint8Array<ArrayBuffer>> {
  const declared = Number(request.headers.get("content-length") ?? "NaN");
  if (Number.isFinite(declared) && declared > limitBytes) throw new PayloadTooLarge(limitBytes);
  if (!request.body) return new Uint8Array();
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limitBytes) {
      await reader.cancel().catch(() => {});
      throw new PayloadTooLarge(limitBytes);
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const chunk of chunks) {
    out.set(chunk, at);
    at += chunk.byteLength;
  }
  return out;
}

export async function readLimitedText(request: Request, limitBytes: number): Promise<string> {
  return new TextDecoder("utf-8").decode(await readLimitedBytes(request, limitBytes));
}

/** The parsed JSON body; 415 when it is not declared as JSON, 400 when it does not parse. */
export async function readJsonBody(request: Request, limitBytes: number): Promise<unknown> {
  if (!isJsonContentType(request.headers.get("content-type"))) throw new UnsupportedMediaType();
  const text = await readLimitedText(request, limitBytes);
  if (text.trim() === "") throw new HttpError(400, "the request body is empty; send a JSON object");
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new HttpError(400, "the request body is not valid JSON");
  }
}
