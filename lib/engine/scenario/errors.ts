/** A validation error: where (dotted path), what was there, which rule it broke, and a sentence. */
export interface ScenarioError {
  path: string;
  value: unknown;
  rule: string;
  message: string;
}

export type PathPart = string | number;

export function formatPath(parts: readonly PathPart[]): string {
  let out = "";
  for (const part of parts) {
    if (typeof part === "number") out += `[${part}]`;
    else out += out === "" ? part : `.${part}`;
  }
  return out === "" ? "(scenario)" : out;
}

/** Reads the value at a path of the raw input, so messages show what the user sent. */
export function valueAt(input: unknown, parts: readonly PathPart[]): unknown {
  let cur: unknown = input;
  for (const part of parts) {
    if (cur === null || typeof cur !== "object") return undefined;
    cur = (cur as Record<string | number, unknown>)[part];
  }
  return cur;
}

export function showValue(value: unknown): string {
  if (value === undefined) return "nothing";
  if (typeof value === "number") return String(value); // NaN and Infinity print as such
  if (Array.isArray(value)) {
    const head = value.slice(0, 6).map((v) => (typeof v === "number" ? String(v) : JSON.stringify(v)));
    return `[${head.join(", ")}${value.length > 6 ? `, … (${value.length} items)` : ""}]`;
  }
  const text = JSON.stringify(value);
  return text.length > 80 ? `${text.slice(0, 77)}…` : text;
}

export function makeError(input: unknown, parts: readonly PathPart[], rule: string, value?: unknown): ScenarioError {
  const path = formatPath(parts);
  const shown = value === undefined ? valueAt(input, parts) : value;
  return { path, value: shown ?? null, rule, message: `${path}: ${rule} (got ${showValue(shown)})` };
}
