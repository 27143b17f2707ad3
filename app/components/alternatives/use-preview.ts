import { useEffect, useRef, useState } from "react";
import { isAbort, requestPreview } from "./api-client";
import type { AlternativeDraft, PreviewResult } from "./api-types";

/** Least time between two preview requests while a PI is dragged (about four frames). */
export const PREVIEW_INTERVAL_MS = 60;

export interface PreviewState {
  /** The last result that computed; kept when a later edit does not (the map never goes blank). */
  result: PreviewResult | null;
  /** The engine's message for the current draft when it does not compute (e.g. tangents overrun). */
  error: string | null;
  pending: boolean;
  /** The draft `result` was computed for (null before the first answer). */
  shownDraft: AlternativeDraft | null;
}

/**
 * Recomputes corridor and takes for the draft without saving. While dragging (`live`), requests
 * go at most every PREVIEW_INTERVAL_MS, one at a time, and the newest waiting draft goes next —
 * the drafts in between are skipped. Any other edit cancels the request in flight (it is stale)
 * and asks at once. An answer older than the one shown is dropped. A new `savedVersion` asks
 * again: the preview reviews design checks against the saved speed, emax and acceptances.
 */
export function usePreview(alternativeId: number, draft: AlternativeDraft, live: boolean, savedVersion = 0): PreviewState {
  const [state, setState] = useState<PreviewState>({ result: null, error: null, pending: true, shownDraft: null });
  const latest = useRef(draft);
  const flight = useRef<{ controller: AbortController; seq: number } | null>(null);
  const waiting = useRef(false);
  const timer = useRef<number | null>(null);
  const lastSent = useRef(0);
  const seq = useRef(0);
  const shownSeq = useRef(0);

  useEffect(() => {
    latest.current = draft;
    setState((s) => (s.pending ? s : { ...s, pending: true }));
    if (live) schedule();
    else {
      flight.current?.controller.abort();
      flight.current = null;
      send();
    }
  }, [draft, savedVersion]); // eslint-disable-line react-hooks/exhaustive-deps

  useEffect(() => () => {
    flight.current?.controller.abort();
    if (timer.current !== null) cancelAnimationFrame(timer.current);
  }, []);

  function schedule() {
    if (flight.current || timer.current !== null) {
      waiting.current = true;
      return;
    }
    timer.current = requestAnimationFrame(() => {
      timer.current = null;
      if (performance.now() - lastSent.current < PREVIEW_INTERVAL_MS) schedule();
      else send();
    });
  }

  function send() {
    const mine = { controller: new AbortController(), seq: ++seq.current };
    flight.current = mine;
    waiting.current = false;
    lastSent.current = performance.now();
    setState((s) => (s.pending ? s : { ...s, pending: true }));
    const sent = latest.current;
    requestPreview(alternativeId, sent, mine.controller.signal)
      .then((outcome) => {
        if (mine.seq < shownSeq.current) return;
        shownSeq.current = mine.seq;
        const newest = mine.seq === seq.current && !waiting.current;
        setState((s) => (outcome.ok ? { result: outcome.value, error: null, pending: !newest, shownDraft: sent } : { ...s, error: outcome.message, pending: !newest }));
      })
      .catch((error: unknown) => {
        if (!isAbort(error)) setState((s) => ({ ...s, error: "The preview could not reach the server; check the connection.", pending: false }));
      })
      .finally(() => {
        if (flight.current !== mine) return;
        flight.current = null;
        if (waiting.current) schedule();
      });
  }

  return state;
}
