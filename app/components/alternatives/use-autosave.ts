import { useCallback, useEffect, useRef, useState } from "react";
import { saveDraft } from "./api-client";
import type { AlternativeDraft, CheckAcceptance } from "./api-types";

/** Quiet time after the last edit before it is saved. */
export const AUTOSAVE_DELAY_MS = 800;
const RETRY_MS = 5000;

export type SaveState =
  | { kind: "saved"; version: number }
  | { kind: "unsaved"; version: number }
  | { kind: "saving"; version: number }
  | { kind: "conflict"; version: number; currentVersion: number; message: string }
  | { kind: "refused"; version: number; message: string }
  | { kind: "offline"; version: number };

/**
 * Saves the committed draft after a pause, with the version it was edited from. A 409 stops
 * autosaving (nothing is overwritten; the planner reloads); a refusal waits for the next edit;
 * a lost connection retries. `flush` saves now and resolves once the draft is stored (or not).
 */
export function useAutosave(alternativeId: number, initialVersion: number, draft: AlternativeDraft, enabled: boolean) {
  const [state, setState] = useState<SaveState>({ kind: "saved", version: initialVersion });
  // The acceptances as the server stored (and stamped) them in the last save.
  const [savedAcceptances, setSavedAcceptances] = useState<CheckAcceptance[] | null>(null);
  const version = useRef(initialVersion);
  const saved = useRef(draft);
  const latest = useRef(draft);
  const running = useRef<Promise<boolean> | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const stopped = useRef(false);

  const save = useCallback((): Promise<boolean> => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    if (stopped.current) return Promise.resolve(false);
    if (latest.current === saved.current) return running.current ?? Promise.resolve(true);
    if (running.current) return running.current.then(() => save());
    const sending = latest.current;
    setState({ kind: "saving", version: version.current });
    running.current = saveDraft(alternativeId, version.current, sending)
      .then((outcome) => {
        if (outcome.ok) {
          version.current = outcome.value.version;
          saved.current = sending;
          setSavedAcceptances(outcome.value.acceptedChecks ?? null);
          setState({ kind: latest.current === sending ? "saved" : "unsaved", version: version.current });
          return true;
        }
        if (outcome.status === 409) {
          stopped.current = true;
          const current = (outcome.details as { currentVersion?: number } | undefined)?.currentVersion ?? version.current;
          setState({ kind: "conflict", version: version.current, currentVersion: current, message: outcome.message });
        } else setState({ kind: "refused", version: version.current, message: outcome.message });
        return false;
      })
      .catch(() => {
        setState({ kind: "offline", version: version.current });
        timer.current = setTimeout(() => void save(), RETRY_MS);
        return false;
      })
      .finally(() => {
        running.current = null;
      });
    return running.current.then((ok) => (ok && latest.current !== saved.current ? save() : ok));
  }, [alternativeId]);

  useEffect(() => {
    latest.current = draft;
    if (!enabled || stopped.current) return;
    if (draft === saved.current) {
      setState((s) => (s.kind === "saving" ? s : { kind: "saved", version: version.current }));
      return;
    }
    setState((s) => (s.kind === "saving" ? s : { kind: "unsaved", version: version.current }));
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(() => void save(), AUTOSAVE_DELAY_MS);
  }, [draft, enabled, save]);

  useEffect(() => () => {
    if (timer.current) clearTimeout(timer.current);
  }, []);

  return { state, flush: save, savedAcceptances };
}
