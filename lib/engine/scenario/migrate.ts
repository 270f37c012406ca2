import { SCENARIO_FORMAT_V1 } from "./schema";
import { makeError, type ScenarioError } from "./errors";

/**
 * Brings a scenario of any known format version to the current one. Each step maps one
 * version to the next; v1 is the first version, so today the chain is empty and v1 passes
 * through unchanged. A later v2 adds `{ from: "joulebook.scenario/1", to: ".../2", up }`.
 */
interface Migration {
  from: string;
  to: string;
  up: (doc: Record<string, unknown>) => Record<string, unknown>;
}

const MIGRATIONS: readonly Migration[] = [];
export const CURRENT_FORMAT = SCENARIO_FORMAT_V1;

export type MigrateOutcome = { ok: true; value: Record<string, unknown> } | { ok: false; errors: ScenarioError[] };

export function migrateScenario(input: unknown): MigrateOutcome {
  if (input === null || typeof input !== "object" || Array.isArray(input))
    return { ok: false, errors: [makeError(input, [], "a scenario must be a JSON object", input)] };
  let doc = input as Record<string, unknown>;
  const seen = new Set<string>();
  while (doc.format !== CURRENT_FORMAT) {
    const step = MIGRATIONS.find((m) => m.from === doc.format);
    if (!step || seen.has(step.from)) {
      const known = [CURRENT_FORMAT, ...MIGRATIONS.map((m) => m.from)].map((f) => `"${f}"`).join(", ");
      return { ok: false, errors: [makeError(input, ["format"], `unknown scenario format; expected one of ${known}`)] };
    }
    seen.add(step.from);
    doc = step.up(doc);
  }
  return { ok: true, value: doc };
}
