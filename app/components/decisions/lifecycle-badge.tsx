import { STATE_LABELS, type AlternativeState } from "~/calculations/alternative-lifecycle";
import { Badge, type BadgeTone } from "~/components/ui/badge";

const TONE: Record<AlternativeState, BadgeTone> = { draft: "neutral", submitted: "caution", approved: "action", returned: "danger", superseded: "neutral" };

/** An alternative's lifecycle state in our plain words. */
export function LifecycleBadge({ state }: { state: AlternativeState }) {
  return <Badge tone={TONE[state]}>{STATE_LABELS[state]}</Badge>;
}
