import { useState } from "react";
import { Badge } from "~/components/ui/badge";
import { Button } from "~/components/ui/button";
import { Dialog } from "~/components/ui/dialog";
import type { CheckAcceptance, ReviewedCheck } from "./api-types";
import { StaleAcceptances } from "./stale-acceptances";

/**
 * Design-check results beside the elements. Checks never block: a planner may accept a warning,
 * but only with a reason, which is stored with the alternative and shown to everyone.
 */
export function DesignChecksPanel({ checks, stale, editable, onAccept, onWithdraw, onDropStale }: {
  checks: ReviewedCheck[];
  /** Acceptances that match no current warning. */
  stale: CheckAcceptance[];
  editable: boolean;
  onDropStale: (ids: string[]) => void;
  onAccept: (id: string, reason: string) => void;
  onWithdraw: (id: string) => void;
}) {
  const [accepting, setAccepting] = useState<ReviewedCheck | null>(null);
  const warnings = checks.filter((c) => c.severity === "warning");
  const passed = checks.length - warnings.length;
  return (
    <div className="space-y-3" data-testid="design-checks">
      <p className="text-sm text-ink-soft">{warnings.length === 0 ? `All ${passed} checks met.` : `${warnings.length} warning${warnings.length === 1 ? "" : "s"}; ${passed} checks met.`}</p>
      <ul className="space-y-2">
        {warnings.map((c) => (
          <li key={c.id} className="rounded-md border border-rule p-3 text-sm">
            <div className="flex flex-wrap items-start justify-between gap-2">
              <p className="flex-1">
                {c.piIndex !== undefined && <strong>PI {c.piIndex}: </strong>}
                {c.message}
              </p>
              {c.accepted ? <Badge tone="info">accepted</Badge> : <Badge tone="caution">warning</Badge>}
            </div>
            <p className="mt-1 text-xs text-ink-soft">Source: {c.source}</p>
            {c.accepted && <p className="mt-1 text-xs">Reason given: “{c.accepted.reason}”{acceptedByline(c.accepted)}</p>}
            {editable && (
              <div className="mt-2">
                {c.accepted ? (
                  <Button variant="quiet" onClick={() => onWithdraw(c.id)}>Withdraw acceptance</Button>
                ) : (
                  <Button variant="secondary" onClick={() => setAccepting(c)}>Accept with a reason…</Button>
                )}
              </div>
            )}
          </li>
        ))}
      </ul>
      <StaleAcceptances stale={stale} editable={editable} onDrop={onDropStale} />
      <AcceptDialog check={accepting} onClose={() => setAccepting(null)} onAccept={(reason) => { if (accepting) onAccept(accepting.id, reason); setAccepting(null); }} />
    </div>
  );
}

function AcceptDialog({ check, onClose, onAccept }: { check: ReviewedCheck | null; onClose: () => void; onAccept: (reason: string) => void }) {
  const [reason, setReason] = useState("");
  const tooShort = reason.trim().length < 3;
  return (
    <Dialog open={check !== null} onClose={() => { setReason(""); onClose(); }} title="Accept a design-check warning">
      <form method="dialog" className="space-y-3" onSubmit={(e) => { e.preventDefault(); if (!tooShort) { onAccept(reason.trim()); setReason(""); } }}>
        <p className="text-sm">{check?.message}</p>
        <label className="block text-label font-semibold" htmlFor="accept-reason">Reason for going ahead</label>
        <textarea id="accept-reason" required minLength={3} maxLength={2000} rows={4} value={reason} onChange={(e) => setReason(e.target.value)}
          className="block w-full rounded-control border border-rule-strong px-3 py-2 text-sm" />
        <p className="text-xs text-ink-soft">The reason is saved with the alternative. Accepting a warning does not make the design meet the rule.</p>
        <div className="flex justify-end gap-2">
          <Button variant="secondary" onClick={() => { setReason(""); onClose(); }}>Cancel</Button>
          <Button type="submit" disabled={tooShort}>Accept</Button>
        </div>
      </form>
    </Dialog>
  );
}

/** "— Name, 2 Dec 2026" once the server has stamped the acceptance (on save; a reload shows it). */
function acceptedByline(a: NonNullable<ReviewedCheck["accepted"]>): string {
  if (!a.acceptedBy) return "";
  const day = a.acceptedAt ? new Date(a.acceptedAt).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" }) : "";
  return ` — ${a.acceptedBy}${day ? `, ${day}` : ""}`;
}
