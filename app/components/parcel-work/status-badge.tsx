import { ACQUISITION_LABELS, type AcquisitionStatus } from "~/calculations/acquisition-status";
import { Badge, type BadgeTone } from "~/components/ui/badge";

const TONE: Record<AcquisitionStatus, BadgeTone> = {
  "not-started": "neutral",
  "owner-contacted": "info",
  appraisal: "info",
  "offer-made": "info",
  agreed: "action",
  acquired: "action",
  escalated: "danger",
};

/** A parcel's acquisition status in our plain words. */
export function StatusBadge({ status, released = false }: { status: AcquisitionStatus; released?: boolean }) {
  if (released) return <Badge tone="neutral">Released</Badge>;
  return <Badge tone={TONE[status]}>{ACQUISITION_LABELS[status]}</Badge>;
}
