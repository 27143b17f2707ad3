import type { UploadPhase } from "./send-with-progress";

function labelOf(phase: UploadPhase): string {
  if (phase.phase === "uploading") return `Uploading… ${Math.round(phase.fraction * 100)} %`;
  if (phase.fraction === null) return "Reading and checking the file…";
  return `${phase.label ?? "Processing"}… ${Math.round(phase.fraction * 100)} %`;
}

/** Upload progress as a real fraction, then the server's processing progress (indeterminate until its first report). */
export function UploadProgress({ phase }: { phase: UploadPhase }) {
  const label = labelOf(phase);
  const fraction = phase.fraction;
  return (
    <div className="space-y-1" data-testid="upload-progress">
      <p className="text-sm text-ink-soft">{label}</p>
      <div className="h-2 overflow-hidden rounded-full bg-paper" role="progressbar" aria-label={label}
        aria-valuenow={fraction === null ? undefined : Math.round(fraction * 100)} aria-valuemin={0} aria-valuemax={100}>
        {fraction === null ? (
          <div className="h-full w-1/3 animate-pulse bg-action" />
        ) : (
          <div className="h-full bg-action transition-[width]" style={{ width: `${fraction * 100}%` }} />
        )}
      </div>
    </div>
  );
}
