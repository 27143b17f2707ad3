import { useCallback, useEffect, useState } from "react";
import type { AlternativeDraft } from "./api-types";
import { commitEdit, createHistory, redoEdit, undoEdit, type EditHistory } from "./edit-history";

export interface AlternativeEditor {
  /** What is drawn and previewed: the live state while dragging, else the committed one. */
  draft: AlternativeDraft;
  /** The last committed state (what autosave stores). */
  committed: AlternativeDraft;
  live: boolean;
  canUndo: boolean;
  canRedo: boolean;
  commit: (next: AlternativeDraft) => void;
  /** A drag step: shown and previewed, not a history step of its own. */
  drag: (next: AlternativeDraft) => void;
  /** Ends a drag: its last state becomes one history step. */
  endDrag: () => void;
  undo: () => void;
  redo: () => void;
}

/** The editor's draft with undo/redo; Ctrl+Z and Ctrl+Shift+Z (or Ctrl+Y) outside text fields. */
export function useAlternativeEditor(initial: AlternativeDraft, editable: boolean): AlternativeEditor {
  const [history, setHistory] = useState<EditHistory<AlternativeDraft>>(() => createHistory(initial));
  const [liveDraft, setLiveDraft] = useState<AlternativeDraft | null>(null);

  const commit = useCallback((next: AlternativeDraft) => {
    setLiveDraft(null);
    setHistory((h) => commitEdit(h, next));
  }, []);
  const endDrag = useCallback(() => {
    setLiveDraft((live) => {
      if (live) setHistory((h) => commitEdit(h, live));
      return null;
    });
  }, []);
  const undo = useCallback(() => setHistory(undoEdit), []);
  const redo = useCallback(() => setHistory(redoEdit), []);

  useEffect(() => {
    if (!editable) return;
    const onKey = (e: KeyboardEvent) => {
      if (!(e.ctrlKey || e.metaKey) || isTextEntry(e.target)) return;
      const key = e.key.toLowerCase();
      if (key === "z" && !e.shiftKey) undo();
      else if ((key === "z" && e.shiftKey) || key === "y") redo();
      else return;
      e.preventDefault();
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [editable, undo, redo]);

  return {
    draft: liveDraft ?? history.present,
    committed: history.present,
    live: liveDraft !== null,
    canUndo: history.past.length > 0,
    canRedo: history.future.length > 0,
    commit,
    drag: setLiveDraft,
    endDrag,
    undo,
    redo,
  };
}

/** Text fields keep the browser's own undo for what is being typed. */
export function isTextEntry(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  return target.isContentEditable || target instanceof HTMLTextAreaElement || target instanceof HTMLSelectElement || (target instanceof HTMLInputElement && !["checkbox", "radio", "button"].includes(target.type));
}
