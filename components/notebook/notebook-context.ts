"use client";
// What every block of an open document needs, in two contexts so that a recalculation re-renders
// only what shows results: the stable part (shared doc, presence, undo manager, edit right,
// block list) and the newest evaluation.
import { createContext, useContext } from "react";
import type * as Y from "yjs";
import type { Awareness } from "y-protocols/awareness";
import type { EvaluationState } from "@/lib/client/notebook/use-evaluation";
import type { BlockRef } from "@/lib/client/notebook/use-blocks";

export interface NotebookContextValue {
  doc: Y.Doc;
  awareness: Awareness;
  undoManager: Y.UndoManager;
  canEdit: boolean;
  blocks: BlockRef[];
  focusBlock: (blockId: string) => void;
  /** runs a structural change (add, move, delete, …) as its own undo step */
  step: (change: () => void) => void;
  /** the document's workspace (its library feeds the library-reference pickers) */
  workspaceId: string;
}

export const NotebookContext = createContext<NotebookContextValue | null>(null);
export const EvaluationContext = createContext<EvaluationState | null>(null);

export function useNotebook(): NotebookContextValue {
  const value = useContext(NotebookContext);
  if (!value) throw new Error("useNotebook outside a notebook");
  return value;
}

export function useEvaluationState(): EvaluationState {
  const value = useContext(EvaluationContext);
  if (!value) throw new Error("useEvaluationState outside a notebook");
  return value;
}
