import type { UploadPhase } from "./send-with-progress";

/** Upload progress as a real fraction; processing as an indeterminate bar (the server does not report steps). */
export function UploadProgress({ phase }: { phase: UploadPhase }) {
  const label = phase.phase === "uploading" ? `Uploading… ${Math.round(phase.fraction * 100)} %` : "Reading and checking the file…";
  return (
    <div className="space-y-1" data-testid="upload-progress">
      <p className="text-sm text-ink-soft">{label}</p>
      <div className="h-2 overflow-hidden rounded-full bg-paper" role="progressbar" aria-label={label}
        aria-valuenow={phase.phase === "uploading" ? Math.round(phase.fraction * 100) : undefined} aria-valuemin={0} aria-valuemax={100}>
        {phase.phase === "uploading" ? (
          <div className="h-full bg-action transition-[width]" style={{ width: `${phase.fraction * 100}%` }} />
        ) : (
          <div className="h-full w-1/3 animate-pulse bg-action" />
        )}
      </div>
    </div>
  );
}
