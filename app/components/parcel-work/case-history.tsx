import { ACQUISITION_LABELS, type AcquisitionStatus } from "~/calculations/acquisition-status";
import { formatMoment } from "./figures";

export interface CaseHistoryItem {
  id: number;
  at: string;
  kind: "opened" | "assigned" | "status" | "note" | "take-updated" | "released" | "reopened";
  fromValue: string | null;
  toValue: string | null;
  note: string;
  actorName: string | null;
}

const label = (s: string | null) => (s && s in ACQUISITION_LABELS ? ACQUISITION_LABELS[s as AcquisitionStatus] : (s ?? "nobody"));

function describe(e: CaseHistoryItem): string {
  switch (e.kind) {
    case "opened":
      return "Taken by the approved alternative; case opened";
    case "assigned":
      return e.toValue ? `Assigned to ${e.toValue}${e.fromValue ? ` (was ${e.fromValue})` : ""}` : `Unassigned (was ${e.fromValue ?? "nobody"})`;
    case "status":
      return `Status: ${label(e.fromValue)} → ${label(e.toValue)}`;
    case "note":
      return "Note";
    case "take-updated":
      return "A new preferred alternative was approved; take figures updated";
    case "reopened":
      return "Taken again by a new preferred alternative; case reopened";
    case "released":
      return "Released";
  }
}

/** The parcel's history, newest first: who did what, when. */
export function CaseHistory({ events }: { events: CaseHistoryItem[] }) {
  return (
    <ol className="space-y-3" data-testid="case-history">
      {events.map((e) => (
        <li key={e.id} className="border-l-2 border-rule pl-3 text-sm">
          <p className="font-semibold">{describe(e)}</p>
          {e.note && <p className="whitespace-pre-wrap">{e.note}</p>}
          <p className="text-xs text-ink-soft">{formatMoment(e.at)}{e.actorName ? ` · ${e.actorName}` : ""}</p>
        </li>
      ))}
    </ol>
  );
}
