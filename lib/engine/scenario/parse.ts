import { scenarioSchema, type Scenario } from "./schema";
import type { ScenarioError } from "./errors";
import { fromZodIssues } from "./zod-issues";
import { migrateScenario } from "./migrate";
import { checkScenario } from "./rules";

export type ParseOutcome = { ok: true; scenario: Scenario } | { ok: false; errors: ScenarioError[] };

/** Migrates, checks the shape (with defaults), then the cross-field rules. */
export function parseScenario(input: unknown): ParseOutcome {
  const migrated = migrateScenario(input);
  if (!migrated.ok) return migrated;
  const parsed = scenarioSchema.safeParse(migrated.value, { reportInput: true });
  if (!parsed.success) return { ok: false, errors: fromZodIssues(migrated.value, parsed.error.issues) };
  const errors = checkScenario(parsed.data, migrated.value);
  return errors.length > 0 ? { ok: false, errors } : { ok: true, scenario: parsed.data };
}
