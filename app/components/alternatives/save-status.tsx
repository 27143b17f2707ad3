import { Button } from "~/components/ui/button";
import type { SaveState } from "./use-autosave";

/** Where autosave stands; a conflict is a banner with a reload, since nothing more can be saved. */
export function SaveStatus({ state, onRetry }: { state: SaveState; onRetry: () => void }) {
  if (state.kind === "conflict") {
    return (
      <div role="alert" className="flex flex-wrap items-center gap-3 rounded-md border-l-4 border-danger bg-danger-tint px-4 py-3 text-sm" data-testid="save-conflict">
        <p className="flex-1">
          <strong>Someone else saved version {state.currentVersion}</strong> while you were editing version {state.version}. Reload to see their
          version — nothing was overwritten, and your unsaved changes here are not stored.
        </p>
        <Button onClick={() => window.location.reload()}>Reload</Button>
      </div>
    );
  }
  const text: Record<Exclude<SaveState["kind"], "conflict">, string> = {
    saved: `Saved · version ${state.version}`,
    unsaved: "Unsaved changes…",
    saving: "Saving…",
    refused: "Not saved: ",
    offline: "Not saved: the server cannot be reached; retrying.",
  };
  return (
    <p role="status" className={`flex items-center gap-2 text-sm ${state.kind === "refused" || state.kind === "offline" ? "text-danger" : "text-ink-soft"}`} data-testid="save-status">
      {text[state.kind]}
      {state.kind === "refused" && state.message}
      {(state.kind === "refused" || state.kind === "offline") && <Button variant="quiet" onClick={onRetry}>Try again</Button>}
    </p>
  );
}
