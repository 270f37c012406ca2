import "server-only";
// What an export is made of: the Scenario and a full Result of the document's current state (its
// Yjs document compiled with library references resolved) or of a saved version (its stored
// Scenario, evaluated again: the engine is deterministic), plus the block notes.
import * as Y from "yjs";
import { getDocumentForExport, getVersionForExport, getWorkspaceName } from "@/db/library-exports";
import { evaluateScenarioInput, type Result } from "@/lib/engine";
import { authorizeWorkspace, isUuid } from "@/lib/authz";
import { Conflict, NotFound } from "@/lib/http/errors";
import { libraryResolverFor } from "@/lib/library/resolver";
import { compile, readDoc, type DocSnapshot } from "@/lib/notebook";

export interface ExportSource {
  title: string;
  workspaceName: string;
  versionId: string | null;
  versionLabel: string;
  scenario: unknown;
  result: Result;
  notes: { block: string; text: string }[];
}

class NotEvaluable extends Conflict {
  constructor(message: string, readonly problems: string[]) {
    super(message);
  }
  override body(): Record<string, unknown> {
    return { error: this.message, problems: this.problems };
  }
}

function snapshotOf(state: Uint8Array | null): DocSnapshot {
  const doc = new Y.Doc();
  try {
    if (state) Y.applyUpdate(doc, state);
    return readDoc(doc);
  } finally {
    doc.destroy();
  }
}

function evaluate(scenario: unknown, what: string): Result {
  const out = evaluateScenarioInput(scenario);
  if (!out.ok) throw new NotEvaluable(`${what} does not evaluate`, out.errors.map((e) => e.message));
  return out.result;
}

export async function loadExportSource(args: { userId: string; workspaceId: string; documentId: string; versionId: string | null }): Promise<ExportSource> {
  await authorizeWorkspace({ userId: args.userId, workspaceId: args.workspaceId, action: args.versionId ? "version.read" : "document.read" });
  const doc = isUuid(args.documentId) ? await getDocumentForExport({ workspaceId: args.workspaceId, documentId: args.documentId }) : null;
  if (!doc) throw new NotFound("no such document in this workspace");
  const workspaceName = await getWorkspaceName({ workspaceId: args.workspaceId });
  if (args.versionId) {
    const v = isUuid(args.versionId) ? await getVersionForExport({ documentId: doc.id, versionId: args.versionId }) : null;
    if (!v) throw new NotFound("no such version of this document");
    const label = `version ${v.number} — ${v.name}`;
    if (!v.scenario) throw new NotEvaluable(`${label} has no scenario: it did not compile when it was saved`, v.problems);
    const snap = snapshotOf(v.yjsState);
    return { title: doc.name, workspaceName, versionId: v.id, versionLabel: label, scenario: v.scenario, result: evaluate(v.scenario, label), notes: notesOf(snap) };
  }
  const snap = snapshotOf(doc.state);
  const compiled = compile({ ...snap, resolveLibrary: await libraryResolverFor({ workspaceId: args.workspaceId, blocks: snap.blocks }) });
  if (!compiled.scenario) throw new NotEvaluable("the document does not compile", compiled.messages.filter((m) => m.severity === "error").map((m) => m.text));
  return { title: doc.name, workspaceName, versionId: null, versionLabel: "current draft", scenario: compiled.scenario, result: evaluate(compiled.scenario, "the document"), notes: notesOf(snap) };
}

function notesOf(snap: DocSnapshot): { block: string; text: string }[] {
  return snap.blocks.filter((b) => b.note.trim() !== "").map((b) => ({ block: b.title, text: b.note.trim() }));
}
