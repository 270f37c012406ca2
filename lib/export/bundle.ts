// Scenario + Result as one JSON file. The Scenario is the interchange format (DESIGN §3): it can
// be fed back to `npm run evaluate` or POST /api/evaluate as it is.
import type { Result } from "@/lib/engine";

export const EXPORT_FORMAT = "joulebook.export/1";

export interface ExportBundle {
  format: typeof EXPORT_FORMAT;
  exported_at: string;
  source: { workspace_id: string; document_id: string; version_id: string | null; title: string };
  scenario: unknown;
  result: Result;
}

export function exportBundle(args: { source: ExportBundle["source"]; scenario: unknown; result: Result; now?: Date }): ExportBundle {
  return { format: EXPORT_FORMAT, exported_at: (args.now ?? new Date()).toISOString(), source: args.source, scenario: args.scenario, result: args.result };
}
