import { useEffect, useMemo } from "react";
import type { AlignmentCurveInput, CurveSummary } from "~/geometry/alignment-types";
import { computeMinimumRadius } from "~/geometry/min-radius";
import { convertLength } from "~/geometry/units";
import { curveOfKind, deflectionDeg, deletePoint, insertPoint, movePoint, setCurve, type CurveKind, type Point2 } from "./alignment-edits";
import type { AlternativeDraft, SweepVariable } from "./api-types";
import { findInsertionPoint, insertPointAfter } from "./pi-insertion";
import { applySweepValue } from "./sweep-defaults";
import { isTextEntry, type AlternativeEditor } from "./use-alternative-editor";

/** Coordinates typed or dragged are kept to the millimetre (0.001 of the working unit). */
const roundMm = (v: number) => Math.round(v * 1000) / 1000;

export interface DraftEdits {
  move: (index: number, xy: Point2, live?: boolean) => void;
  nudge: (index: number, dx: number, dy: number) => void;
  add: (xy: Point2) => void;
  /** Inserts an angle point after point `index`, on the tangent that follows (see findInsertionPoint); returns its index. */
  insertAfter: (index: number, curves: readonly CurveSummary[]) => number | null;
  remove: (index: number) => void;
  setKind: (index: number, kind: CurveKind) => void;
  setCurveAt: (index: number, curve: AlignmentCurveInput) => void;
  applySweep: (index: number, vary: SweepVariable, value: number) => void;
  accept: (id: string, reason: string) => void;
  withdraw: (id: string) => void;
  /** Removes acceptances (those that no longer apply) in one edit. */
  dropAcceptances: (ids: string[]) => void;
}

/** The editor's edits as history steps; Delete removes the selected point when focus is not in a field. */
export function useDraftEdits(editor: AlternativeEditor, selected: number | null, setSelected: (i: number | null) => void, editable: boolean): DraftEdits {
  const { draft, commit, drag } = editor;
  const withAlignment = (alignment: AlternativeDraft["alignment"]): AlternativeDraft => ({ ...draft, alignment });
  const edits = useMemo<DraftEdits>(() => ({
    move: (i, xy, live = false) => (live ? drag : commit)(withAlignment(movePoint(draft.alignment, i, [roundMm(xy[0]), roundMm(xy[1])]))),
    nudge: (i, dx, dy) => {
      const p = draft.alignment.points[i];
      if (p) commit(withAlignment(movePoint(draft.alignment, i, [roundMm(p.x + dx), roundMm(p.y + dy)])));
    },
    add: (xy) => {
      const { alignment, index } = insertPoint(draft.alignment, [roundMm(xy[0]), roundMm(xy[1])]);
      commit(withAlignment(alignment));
      setSelected(index);
    },
    insertAfter: (i, curves) => {
      const p = findInsertionPoint(draft.alignment, i, curves);
      if (!p) return null;
      const { alignment, index } = insertPointAfter(draft.alignment, i, [roundMm(p[0]), roundMm(p[1])]);
      commit(withAlignment(alignment));
      setSelected(index);
      return index;
    },
    remove: (i) => {
      if (draft.alignment.points.length <= 2) return;
      commit(withAlignment(deletePoint(draft.alignment, i)));
      setSelected(null);
    },
    setKind: (i, kind) => {
      const current = draft.alignment.points[i]?.curve;
      commit(withAlignment(setCurve(draft.alignment, i, curveOfKind(kind, current, deflectionDeg(draft.alignment.points, i), defaultRadius(draft)))));
    },
    setCurveAt: (i, curve) => commit(withAlignment(setCurve(draft.alignment, i, curve))),
    applySweep: (i, vary, value) => commit(withAlignment(setCurve(draft.alignment, i, applySweepValue(draft.alignment.points[i]?.curve, vary, value)))),
    accept: (id, reason) => commit({ ...draft, acceptedChecks: [...draft.acceptedChecks.filter((a) => a.id !== id), { id, reason }] }),
    withdraw: (id) => commit({ ...draft, acceptedChecks: draft.acceptedChecks.filter((a) => a.id !== id) }),
    dropAcceptances: (ids) => commit({ ...draft, acceptedChecks: draft.acceptedChecks.filter((a) => !ids.includes(a.id)) }),
  }), [draft, commit, drag, setSelected]); // eslint-disable-line react-hooks/exhaustive-deps

  useEffect(() => {
    if (!editable || selected === null) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key !== "Delete" || e.defaultPrevented || isTextEntry(e.target)) return;
      e.preventDefault();
      edits.remove(selected);
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [editable, selected, edits]);

  return edits;
}

/** A new curve's radius: twice the minimum for the design speed (or 500 units when unknown), rounded to 10. */
function defaultRadius(draft: AlternativeDraft): number {
  try {
    const min = computeMinimumRadius({ designSpeed: draft.designSpeed, speedUnit: draft.speedUnit, emaxPercent: draft.emaxPercent });
    return Math.round((2 * convertLength(min.rounded, min.unit, draft.alignment.units)) / 10) * 10;
  } catch {
    return 500;
  }
}
