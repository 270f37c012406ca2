"use client";
// Undo/redo per person: one Y.UndoManager over the blocks and the meta map that tracks only this
// client's own transactions (origin null from lib/notebook helpers, and the CodeMirror bindings
// that register themselves through yCollab). Remote edits are never undone by someone else.
import { useEffect, useMemo, useState } from "react";
import * as Y from "yjs";
import { blocksOf, metaOf } from "@/lib/notebook";

export interface Undo {
  manager: Y.UndoManager;
  canUndo: boolean;
  canRedo: boolean;
  undo: () => void;
  redo: () => void;
}

export function useUndo(doc: Y.Doc, enabled: boolean): Undo {
  // captureTimeout: keystrokes within half a second form one undo step.
  const manager = useMemo(
    () => new Y.UndoManager([blocksOf(doc), metaOf(doc)], { captureTimeout: 500, trackedOrigins: new Set([null]) }),
    [doc],
  );
  const [depth, setDepth] = useState({ undo: 0, redo: 0 });
  useEffect(() => {
    const sync = () => setDepth({ undo: manager.undoStack.length, redo: manager.redoStack.length });
    manager.on("stack-item-added", sync);
    manager.on("stack-item-popped", sync);
    manager.on("stack-cleared", sync);
    // No destroy() here: the manager lives as long as its doc (Yjs destroys it with the doc), and
    // an effect cleanup also runs on React's development remount, which would leave it dead.
    return () => { manager.off("stack-item-added", sync); manager.off("stack-item-popped", sync); manager.off("stack-cleared", sync); };
  }, [manager]);

  // Ctrl/Cmd+Z and Shift+Z (and Ctrl+Y) outside the text editors; inside them CodeMirror's
  // keymap drives the same manager and restores the cursor.
  useEffect(() => {
    if (!enabled) return;
    const onKey = (event: KeyboardEvent) => {
      if (event.defaultPrevented || !(event.ctrlKey || event.metaKey) || event.altKey) return;
      const target = event.target as HTMLElement | null;
      if (target?.closest(".cm-editor") || target?.matches("input, textarea, select")) return;
      const key = event.key.toLowerCase();
      if (key === "z" && !event.shiftKey) { event.preventDefault(); manager.undo(); }
      else if ((key === "z" && event.shiftKey) || key === "y") { event.preventDefault(); manager.redo(); }
    };
    document.addEventListener("keydown", onKey);
    return () => document.removeEventListener("keydown", onKey);
  }, [manager, enabled]);

  return {
    manager,
    canUndo: enabled && depth.undo > 0,
    canRedo: enabled && depth.redo > 0,
    undo: () => { manager.undo(); },
    redo: () => { manager.redo(); },
  };
}
