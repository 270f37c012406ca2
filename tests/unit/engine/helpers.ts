import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { parseScenario, type Scenario } from "@/lib/engine";

export const POWERTRAINS = ["conventional", "bev", "parallel", "series"] as const;

/**
 * The raw JSON of examples/<name>.json (a fresh copy each call, safe to mutate). Typed
 * loosely on purpose: tests reach into it to break fields in every possible way.
 */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export function example(name: string): Record<string, any> {
  const path = fileURLToPath(new URL(`../../../examples/${name}.json`, import.meta.url));
  return JSON.parse(readFileSync(path, "utf8"));
}

export function parsed(raw: unknown): Scenario {
  const r = parseScenario(raw);
  if (!r.ok) throw new Error(r.errors.map((e) => e.message).join("\n"));
  return r.scenario;
}

/** Every number anywhere in a JSON-like value, with its path; used to prove "no NaN". */
export function walkNumbers(value: unknown, path = "$", out: [string, number][] = []): [string, number][] {
  if (typeof value === "number") out.push([path, value]);
  else if (Array.isArray(value)) value.forEach((v, i) => walkNumbers(v, `${path}[${i}]`, out));
  else if (value && typeof value === "object") for (const [k, v] of Object.entries(value)) walkNumbers(v, `${path}.${k}`, out);
  return out;
}
