// Reading the first bytes of a y-websocket message: its type and, for sync messages, the subtype
// and the Yjs update it carries (y-protocols: messageSync 0 → step 1 / step 2 / update).
import * as decoding from "lib0/decoding";

export const MESSAGE_SYNC = 0;
export const MESSAGE_AWARENESS = 1;
export const SYNC_STEP1 = 0;
export const SYNC_STEP2 = 1;
export const SYNC_UPDATE = 2;

export type Incoming =
  | { kind: "write"; update: Uint8Array } // sync step 2 or update: changes the document
  | { kind: "pass" } // sync step 1, awareness: handled by the stock listener
  | { kind: "other" }; // auth / query-awareness / unknown: handled by the stock listener (ignores them)

export function classify(message: Uint8Array): Incoming {
  const decoder = decoding.createDecoder(message);
  const type = decoding.readVarUint(decoder);
  if (type === MESSAGE_AWARENESS) return { kind: "pass" };
  if (type !== MESSAGE_SYNC) return { kind: "other" };
  const sub = decoding.readVarUint(decoder);
  if (sub === SYNC_STEP1) return { kind: "pass" };
  if (sub === SYNC_STEP2 || sub === SYNC_UPDATE) return { kind: "write", update: decoding.readVarUint8Array(decoder) };
  return { kind: "other" };
}

export function toUint8Array(data: ArrayBuffer | Buffer | Buffer[] | Uint8Array): Uint8Array {
  if (Array.isArray(data)) return new Uint8Array(Buffer.concat(data));
  if (data instanceof ArrayBuffer) return new Uint8Array(data);
  return new Uint8Array(data.buffer, data.byteOffset, data.byteLength);
}
