"use client";
// A CodeMirror 6 editor bound to one Y.Text through y-codemirror.next: concurrent typing merges,
// remote cursors show in the peer's colour, and Ctrl/Cmd+Z drives the person's shared
// Y.UndoManager. Created once per Y.Text; read-only people get a non-editable view.
import { useEffect, useRef } from "react";
import type * as Y from "yjs";
import type { Awareness } from "y-protocols/awareness";
import { Compartment, EditorState, type Extension } from "@codemirror/state";
import { EditorView, keymap, placeholder as placeholderExt } from "@codemirror/view";
import { defaultKeymap } from "@codemirror/commands";
import { yCollab, yUndoManagerKeymap } from "y-codemirror.next";

export interface TextEditorProps {
  text: Y.Text;
  awareness: Awareness;
  undoManager: Y.UndoManager;
  readOnly: boolean;
  label: string;
  multiline?: boolean;
  placeholder?: string;
  invalid?: boolean;
  describedBy?: string;
  className?: string;
  /** a note: proportional type instead of the monospace of values and formulas */
  prose?: boolean;
  onFocus?: () => void;
}

const theme = EditorView.theme({
  "&": { fontSize: "0.875rem" },
  "&.cm-focused": { outline: "none" },
  ".cm-content": { padding: "0.4rem 0", caretColor: "#1e1b16" },
  ".cm-line": { padding: "0 0.6rem" },
  ".cm-scroller": { fontFamily: "inherit", lineHeight: "1.5" },
  ".cm-ySelectionInfo": { fontFamily: "var(--font-inter), sans-serif", fontSize: "0.68rem", padding: "1px 4px", borderRadius: "3px", opacity: "1" },
});

// A single-line field: Enter does nothing, typed or pasted line breaks become spaces.
const singleLine: Extension = [
  keymap.of([{ key: "Enter", run: () => true }]),
  EditorState.transactionFilter.of((tr) => {
    if (!tr.docChanged || !(tr.isUserEvent("input") || tr.isUserEvent("paste"))) return tr;
    let hasBreak = false;
    tr.changes.iterChanges((_a, _b, _c, _d, inserted) => { if (inserted.lines > 1) hasBreak = true; });
    if (!hasBreak) return tr;
    const changes: { from: number; to: number; insert: string }[] = [];
    tr.changes.iterChanges((from, to, _c, _d, inserted) => changes.push({ from, to, insert: inserted.toString().replace(/\r?\n/g, " ") }));
    return [{ changes }];
  }),
];

function contentAttrs(label: string, readOnly: boolean, invalid?: boolean, describedBy?: string): Extension {
  const attrs: Record<string, string> = { "aria-label": label };
  if (invalid) attrs["aria-invalid"] = "true";
  if (describedBy) attrs["aria-describedby"] = describedBy;
  if (readOnly) attrs["aria-readonly"] = "true";
  return EditorView.contentAttributes.of(attrs);
}

export function TextEditor(props: TextEditorProps) {
  const host = useRef<HTMLDivElement>(null);
  const viewRef = useRef<EditorView | null>(null);
  const attrsCompartment = useRef(new Compartment());
  const focusRef = useRef(props.onFocus);
  focusRef.current = props.onFocus;
  const { text, awareness, undoManager, readOnly, label, multiline, placeholder, invalid, describedBy } = props;

  useEffect(() => {
    if (!host.current) return;
    const view = new EditorView({
      parent: host.current,
      state: EditorState.create({
        doc: text.toString(),
        extensions: [
          keymap.of([...yUndoManagerKeymap, ...defaultKeymap]),
          yCollab(text, awareness, { undoManager }),
          EditorView.lineWrapping,
          multiline ? [] : singleLine,
          EditorState.readOnly.of(readOnly),
          EditorView.editable.of(!readOnly),
          attrsCompartment.current.of(contentAttrs(label, readOnly, invalid, describedBy)),
          EditorView.domEventHandlers({ focus: () => { focusRef.current?.(); return false; } }),
          placeholder ? placeholderExt(placeholder) : [],
          theme,
        ],
      }),
    });
    viewRef.current = view;
    return () => { view.destroy(); viewRef.current = null; };
    // The error state changes while typing: it is reconfigured below, never by re-creating the view.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [text, awareness, undoManager, readOnly, multiline, placeholder]);

  useEffect(() => {
    viewRef.current?.dispatch({ effects: attrsCompartment.current.reconfigure(contentAttrs(label, readOnly, invalid, describedBy)) });
  }, [label, readOnly, invalid, describedBy]);

  return (
    <div
      ref={host}
      className={
        (props.prose ? "font-sans " : "font-mono ") +
        "rounded-control border bg-paper-raised text-ink focus-within:border-focus focus-within:ring-2 focus-within:ring-focus/25 " +
        (invalid ? "border-danger " : "border-rule-strong ") +
        (readOnly ? "bg-paper-sunk/50 " : "") +
        (props.className ?? "")
      }
    />
  );
}
