/**
 * The stages a land agent moves a parcel through, in their usual order, and an escalation that can
 * interrupt any of them. Plain words of our own; the order is common practice for acquiring land
 * for a public road (contact the owner, appraise, offer, agree, close).
 */
export const ACQUISITION_STAGES = ["not-started", "owner-contacted", "appraisal", "offer-made", "agreed", "acquired"] as const;
export const ACQUISITION_STATUSES = [...ACQUISITION_STAGES, "escalated"] as const;
export type AcquisitionStatus = (typeof ACQUISITION_STATUSES)[number];

export const ACQUISITION_LABELS: Record<AcquisitionStatus, string> = {
  "not-started": "Not started",
  "owner-contacted": "Owner contacted",
  appraisal: "Appraisal",
  "offer-made": "Offer made",
  agreed: "Agreed",
  acquired: "Acquired",
  escalated: "Escalated",
};

/** Statuses whose estimated cost counts as committed: the owner has agreed, or the land is ours. */
export const COMMITTED_STATUSES: readonly AcquisitionStatus[] = ["agreed", "acquired"];

export type StatusMove = { ok: true; changed: boolean } | { ok: false; message: string };

/**
 * Whether a parcel may move from one status to another. Acquired is final; a parcel is acquired
 * only once agreed; escalation can interrupt any open stage and the agent resumes at any stage
 * short of acquired; moving back (a deal that fell through, a mistake) is allowed. The same
 * status is no change.
 */
export function checkStatusMove(from: AcquisitionStatus, to: AcquisitionStatus): StatusMove {
  if (from === to) return { ok: true, changed: false };
  if (from === "acquired") return { ok: false, message: "This parcel is acquired; its status can no longer change." };
  if (to === "acquired" && from !== "agreed") return { ok: false, message: `A parcel is acquired only after the owner has agreed; it is at “${ACQUISITION_LABELS[from]}”.` };
  return { ok: true, changed: true };
}

/** The statuses a parcel can move to from `from` (for the form's choices), not counting staying put. */
export function nextStatuses(from: AcquisitionStatus): AcquisitionStatus[] {
  return ACQUISITION_STATUSES.filter((to) => to !== from && checkStatusMove(from, to).ok);
}
