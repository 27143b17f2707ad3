import { Link } from "react-router";
import { Badge } from "~/components/ui/badge";
import { Button } from "~/components/ui/button";
import type { AlternativeJson } from "./api-types";
import { SaveStatus } from "./save-status";
import type { AlternativeEditor } from "./use-alternative-editor";
import type { SaveState } from "./use-autosave";

/** Name, status, where autosave stands, and undo/redo. */
export function EditorHeader({ alternative, projectId, projectName, editable, editor, save, onRetry }: {
  alternative: AlternativeJson;
  projectId: number;
  projectName: string;
  editable: boolean;
  editor: AlternativeEditor;
  save: SaveState;
  onRetry: () => void;
}) {
  return (
    <div className="space-y-3">
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link to={`/projects/${projectId}`}>{projectName}</Link> · <Link to={`/projects/${projectId}/comparison`}>Compare alternatives</Link>
      </nav>
      <div className="flex flex-wrap items-center gap-3">
        <span aria-hidden className="inline-block h-4 w-4 rounded-sm" style={{ background: alternative.colour }} />
        <h1>{alternative.name}</h1>
        <Badge tone={alternative.status === "approved" ? "action" : "neutral"}>{alternative.status}</Badge>
        <div className="ml-auto flex items-center gap-2">
          {editable && (
            <>
              <Button variant="secondary" onClick={editor.undo} disabled={!editor.canUndo} aria-keyshortcuts="Control+Z" title="Undo (Ctrl+Z)">Undo</Button>
              <Button variant="secondary" onClick={editor.redo} disabled={!editor.canRedo} aria-keyshortcuts="Control+Shift+Z" title="Redo (Ctrl+Shift+Z)">Redo</Button>
            </>
          )}
        </div>
      </div>
      {alternative.description && <p className="text-ink-soft">{alternative.description}</p>}
      {editable && alternative.status === "approved" && (
        <p className="text-sm text-ink-soft" data-testid="approved-note">
          Version {alternative.version} is the approved one and stays on record as it is; any change you make saves as a new draft version.
        </p>
      )}
      {editable ? (
        <SaveStatus state={save} onRetry={onRetry} />
      ) : (
        <p className="text-sm text-ink-soft" data-testid="read-only">
          {alternative.status === "submitted" ? "This version awaits a decision; withdraw the submission to change it." : "You are viewing this alternative; only planners edit it."} Version {alternative.version}.
        </p>
      )}
    </div>
  );
}
