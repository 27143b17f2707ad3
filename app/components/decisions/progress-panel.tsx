import { ACQUISITION_LABELS, ACQUISITION_STATUSES, type AcquisitionStatus } from "~/calculations/acquisition-status";
import { formatEstimate } from "~/components/parcel-work/figures";

export interface ProgressData {
  parcels: number;
  unassigned: number;
  byStatus: Record<AcquisitionStatus, { parcels: number; estimatedCost: number }>;
  committedCost: number;
  estimatedCost: number;
  byAgent: { agentId: number | null; name: string | null; email: string | null; parcels: number; acquired: number }[];
}

const BAR: Record<AcquisitionStatus, string> = {
  "not-started": "#d9d4c6",
  "owner-contacted": "#a9c4dd",
  appraisal: "#7fa6cb",
  "offer-made": "#4f80ad",
  agreed: "#5b9a80",
  acquired: "#22594a",
  escalated: "#a12a2a",
};

/** Acquisition progress of the preferred alternative: parcels by status, cost committed so far. */
export function ProgressPanel({ progress, compact = false }: { progress: ProgressData; compact?: boolean }) {
  const total = Math.max(progress.parcels, 1);
  return (
    <div className="space-y-3" data-testid="acquisition-progress">
      <div className="flex h-4 overflow-hidden rounded-full bg-paper" aria-hidden="true">
        {ACQUISITION_STATUSES.map((s) => (
          <span key={s} style={{ width: `${(100 * progress.byStatus[s].parcels) / total}%`, background: BAR[s] }} />
        ))}
      </div>
      <ul className={`grid gap-x-4 gap-y-1 text-sm ${compact ? "grid-cols-2" : "grid-cols-2 md:grid-cols-4"}`}>
        {ACQUISITION_STATUSES.map((s) => (
          <li key={s} className="flex items-center gap-2" data-testid={`progress-${s}`}>
            <span className="inline-block h-3 w-3 rounded-sm" style={{ background: BAR[s] }} />
            {ACQUISITION_LABELS[s]}: <strong className="tabular-nums">{progress.byStatus[s].parcels}</strong>
          </li>
        ))}
      </ul>
      <p className="text-sm">
        <span data-testid="committed-cost">Cost committed so far (agreed or acquired): <strong>{formatEstimate(progress.committedCost)}</strong></span> of{" "}
        {formatEstimate(progress.estimatedCost)} estimated for {progress.parcels} parcels{progress.unassigned ? `; ${progress.unassigned} not yet assigned` : ""}.
      </p>
      {!compact && progress.byAgent.length > 0 && (
        <p className="text-xs text-ink-soft">
          {progress.byAgent.map((a) => `${a.name ?? "Unassigned"}: ${a.parcels} parcels, ${a.acquired} acquired`).join(" · ")}
        </p>
      )}
    </div>
  );
}
