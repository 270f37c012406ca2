// Messages between the notebook page and its evaluation worker. Plain JSON-like data only
// (structured clone): the worker owns no Yjs state, it gets a snapshot of the document.
import type { CompileMessage, DocSnapshot, LibraryItemData } from "@/lib/notebook";
import type { Result, Scenario } from "@/lib/engine";

export interface EvaluateRequest {
  id: number;
  snapshot: DocSnapshot;
  /** library id → item (or why it cannot be used), for the blocks' library references (cycle, full-load, OCV) */
  library?: Record<string, LibraryItemData | string>;
}

/** blockId → field key → compiled value (Scenario unit), for showing "= 1600 kg" next to a field. */
export type CompiledValues = Record<string, Record<string, unknown>>;

/** Parameter name → its value as shown next to it ("1420 kg", "a pure number 96"), or null if it failed. */
export type ParameterValues = Record<string, string | null>;

interface Common {
  id: number;
  messages: CompileMessage[];
  values: CompiledValues;
  parameters: ParameterValues;
  elapsed_ms: number;
}

/** On success also the compiled Scenario (validated by the engine), for views that run more (strategy comparison). */
export type EvaluateResponse = (Common & { ok: true; result: Result; scenario: Scenario }) | (Common & { ok: false });
