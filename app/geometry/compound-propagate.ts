import { applyArcAndAngleRules } from "./compound-arc-rules";
import { completeFromChordPoint } from "./compound-chord-point";
import { completePiTriangle } from "./compound-pi-triangle";
import { applyRadiusRules } from "./compound-radius-rules";
import { isComplete, type CompoundState } from "./compound-state";

/**
 * Applies every closed-form rule until nothing new is learned, then, when the long chord and its
 * angle fix the PT, the chord-point closed forms. Those and the PI triangle (ambiguous case) may
 * branch into two states, so this returns a list: complete states are closed-form solutions,
 * an incomplete state is a seed for the numerical solve, and an empty list means the knowns
 * contradict each other (for instance a triangle that cannot close).
 */
export function propagateCompound(initial: CompoundState, depth = 0): CompoundState[] {
  const s: CompoundState = { ...initial };
  for (let i = 0; i < 24; i++) {
    const a = applyArcAndAngleRules(s);
    const b = applyRadiusRules(s);
    if (!a && !b) break;
  }
  if (isComplete(s)) return [s];
  const fromChord = completeFromChordPoint(s);
  if (fromChord) return fromChord;
  const branches = completePiTriangle(s);
  if (branches === undefined || depth >= 2) return [s];
  return branches.flatMap((b) => propagateCompound(b, depth + 1));
}
