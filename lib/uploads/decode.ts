import { MAX_UPLOAD_BYTES } from "./limits";
import { issue, type UploadIssue } from "./issues";

export type DecodeResult = { ok: true; text: string } | { ok: false; issues: UploadIssue[] };

/** Line (1-based) of a byte offset: count of LF bytes before it, plus one. */
function lineOfByte(bytes: Uint8Array, offset: number): number {
  let line = 1;
  for (let i = 0; i < offset && i < bytes.length; i++) if (bytes[i] === 0x0a) line++;
  return line;
}

/** First offset at which the bytes stop being valid UTF-8, or -1. */
function firstInvalidUtf8(bytes: Uint8Array): number {
  let i = 0;
  while (i < bytes.length) {
    const b = bytes[i];
    let need: number, min: number;
    if (b < 0x80) { i++; continue; }
    if (b >= 0xc2 && b <= 0xdf) { need = 1; min = 0x80; }
    else if (b >= 0xe0 && b <= 0xef) { need = 2; min = 0x800; }
    else if (b >= 0xf0 && b <= 0xf4) { need = 3; min = 0x10000; }
    else return i;
    let cp = b & (0x3f >> need);
    for (let k = 1; k <= need; k++) {
      const c = bytes[i + k];
      if (c === undefined || (c & 0xc0) !== 0x80) return i;
      cp = (cp << 6) | (c & 0x3f);
    }
    if (cp < min || cp > 0x10ffff || (cp >= 0xd800 && cp <= 0xdfff)) return i;
    i += need + 1;
  }
  return -1;
}

const hex = (b: number) => `0x${b.toString(16).toUpperCase().padStart(2, "0")}`;

/**
 * Turns uploaded bytes into text: UTF-8 only (a UTF-8 byte-order mark is accepted and
 * dropped), no binary content, within the size limit.
 */
export function decodeUpload(bytes: Uint8Array, maxBytes = MAX_UPLOAD_BYTES): DecodeResult {
  if (bytes.length === 0) return { ok: false, issues: [issue("the file is empty")] };
  if (bytes.length > maxBytes)
    return { ok: false, issues: [issue(`the file has ${bytes.length} bytes; the limit is ${maxBytes} bytes (${(maxBytes / 1048576).toFixed(0)} MiB)`)] };
  if ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff))
    return { ok: false, issues: [issue("the file is UTF-16 text; save it as UTF-8 (CSV UTF-8) and upload again", 1)] };
  const nul = bytes.indexOf(0);
  if (nul >= 0)
    return { ok: false, issues: [issue(`binary content (a zero byte at byte ${nul}); upload a CSV or TSV text file`, lineOfByte(bytes, nul))] };
  const bad = firstInvalidUtf8(bytes);
  if (bad >= 0)
    return { ok: false, issues: [issue(`not UTF-8 text (byte ${hex(bytes[bad])} at byte ${bad}); save the file as UTF-8 and upload again`, lineOfByte(bytes, bad))] };
  let text = new TextDecoder("utf-8").decode(bytes);
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
  return checkText(text);
}

/** Checks for text that arrived as a string (pasted or JSON): same rules, minus the byte decoding. */
export function checkText(text: string, maxBytes = MAX_UPLOAD_BYTES): DecodeResult {
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
  const size = new TextEncoder().encode(text).length;
  if (size > maxBytes)
    return { ok: false, issues: [issue(`the file has ${size} bytes; the limit is ${maxBytes} bytes (${(maxBytes / 1048576).toFixed(0)} MiB)`)] };
  if (text.trim() === "") return { ok: false, issues: [issue("the file is empty")] };
  const nul = text.indexOf("\u0000");
  if (nul >= 0) {
    const line = text.slice(0, nul).split("\n").length;
    return { ok: false, issues: [issue("binary content (a zero character); upload a CSV or TSV text file", line)] };
  }
  return { ok: true, text };
}
