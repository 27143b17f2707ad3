import { useEffect, useState } from "react";
import { isAbort, requestPreview } from "~/components/alternatives/api-client";
import type { AlternativeDraft } from "~/components/alternatives/api-types";
import { toOverlayData, type OverlayData } from "~/components/map/overlay-data";
import type { WorkingCrs } from "~/components/map/working-crs";

/**
 * The drawn outlines (corridor, easement, takes, centreline) of each saved alternative, asked of
 * the preview API one by one; `errors` holds the message of any that could not be drawn.
 */
export function useAlternativeOutlines(items: { id: number; draft: AlternativeDraft }[], crs: WorkingCrs | null) {
  const [outlines, setOutlines] = useState<Record<number, OverlayData>>({});
  const [errors, setErrors] = useState<Record<number, string>>({});
  useEffect(() => {
    if (!crs) return;
    const controller = new AbortController();
    (async () => {
      for (const item of items) {
        try {
          const outcome = await requestPreview(item.id, item.draft, controller.signal);
          if (outcome.ok) {
            const r = outcome.value;
            setOutlines((o) => ({ ...o, [item.id]: toOverlayData({ ...r.outlines, centerline: r.centerline }, crs) }));
          } else setErrors((e) => ({ ...e, [item.id]: outcome.message }));
        } catch (error) {
          if (isAbort(error)) return;
          setErrors((e) => ({ ...e, [item.id]: "The server could not be reached." }));
        }
      }
    })();
    return () => controller.abort();
  }, [items, crs]);
  return { outlines, errors };
}
