"use client";
// What every block of an open document needs: the shared doc, presence, the person's undo
// manager, whether they may edit, and the newest evaluation.
import { createContext, useContext } from "react";
import type * as Y from "yjs";
import type { Awareness } from "y-protocols/awareness";
import type { EvaluationState } from "@/lib/client/notebook/use-evaluation";
import type { Peer } from "@/lib/client/notebook/presence";
import type { BlockRef } from "@/lib/client/notebook/use-blocks";

export interface NotebookContextValue {
  doc: Y.Doc;
  awareness: Awareness;
  undoManager: Y.UndoManager;
  canEdit: boolean;
  evaluation: EvaluationState;
  blocks: BlockRef[];
  peers: Peer[];
  focusBlock: (blockId: string) => void;
}

export const NotebookContext = createContext<NotebookContextValue | null>(null);

export function useNotebook(): NotebookContextValue {
  const value = useContext(NotebookContext);
  if (!value) throw new Error("useNotebook outside a notebook");
  return value;
}
