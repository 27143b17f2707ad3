import { Badge } from "~/components/ui/badge";
import { Button } from "~/components/ui/button";
import type { CheckAcceptance } from "./api-types";

/** "min-radius:pi-2" → "min-radius at PI 2": the check and the PI it was accepted for. */
export function describeCheckId(id: string): string {
  const m = /^(.+):pi-(\d+)$/.exec(id);
  return m ? `${m[1]} at PI ${m[2]}` : id;
}

function acceptedByText(a: CheckAcceptance): string {
  if (!a.acceptedBy) return "Who accepted it is not recorded.";
  const when = a.acceptedAt ? ` on ${a.acceptedAt.slice(0, 10)}` : "";
  return `Accepted by ${a.acceptedBy}${when}.`;
}

/**
 * Acceptances that match no current warning — the check now passes, or the PI moved or is gone —
 * shown rather than carried silently onto another curve. Dropping them is one edit (undo brings them back).
 */
export function StaleAcceptances({ stale, editable, onDrop }: { stale: CheckAcceptance[]; editable: boolean; onDrop: (ids: string[]) => void }) {
  if (stale.length === 0) return null;
  return (
    <section className="space-y-2" aria-labelledby="stale-acceptances-title" data-testid="stale-acceptances">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 id="stale-acceptances-title" className="text-sm font-semibold">Acceptances that no longer apply</h3>
        {editable && stale.length > 1 && <Button variant="secondary" onClick={() => onDrop(stale.map((a) => a.id))}>Drop all {stale.length}</Button>}
      </div>
      <ul className="space-y-2">
        {stale.map((a) => (
          <li key={a.id} className="rounded-md border border-dashed border-rule-strong p-3 text-sm">
            <div className="flex flex-wrap items-start justify-between gap-2">
              <p className="flex-1"><strong>{describeCheckId(a.id)}</strong>: no current warning matches this acceptance.</p>
              <Badge tone="neutral">no longer applies</Badge>
            </div>
            <p className="mt-1 text-xs">Reason given: “{a.reason}”</p>
            <p className="mt-1 text-xs text-ink-soft">{acceptedByText(a)}</p>
            {editable && (
              <div className="mt-2">
                <Button variant="quiet" onClick={() => onDrop([a.id])} aria-label={`Drop the acceptance of ${describeCheckId(a.id)}`}>Drop</Button>
              </div>
            )}
          </li>
        ))}
      </ul>
    </section>
  );
}
