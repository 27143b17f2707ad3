import { useMemo, useState } from "react";
import { AlternativeEditorMap } from "~/components/map/alternative-editor-map";
import { EMPTY_OVERLAY, toOverlayData } from "~/components/map/overlay-data";
import type { MapLayerInfo } from "~/components/map/project-map";
import { createWorkingCrs, type Xy } from "~/components/map/working-crs";
import { Card } from "~/components/ui/card";
import { applyCheckAcceptances } from "~/calculations/check-acceptances";
import { AffectedParcels } from "./affected-parcels";
import type { AlternativeDraft, AlternativeJson } from "./api-types";
import { CurveElements } from "./curve-elements";
import { CurveTradeoffPanel } from "./curve-tradeoff-panel";
import { DesignChecksPanel } from "./design-checks-panel";
import { DesignSettings } from "./design-settings";
import { EditorHeader } from "./editor-header";
import { EstimateNotice } from "./estimate-notice";
import { areaUnitLabel, lengthUnitLabel } from "./format";
import { PiTable, type PiTableActions } from "./pi-table";
import { TakeTotals } from "./take-totals";
import { useAlternativeEditor } from "./use-alternative-editor";
import { useAutosave } from "./use-autosave";
import { useDraftEdits } from "./use-draft-edits";
import { usePreview } from "./use-preview";

export interface EditorProps {
  alternative: AlternativeJson;
  projectId: number;
  projectName: string;
  layers: MapLayerInfo[];
  basemapStyleUrl: string;
  crsDefinition: string;
  editable: boolean;
}

function draftOf(a: AlternativeJson): AlternativeDraft {
  return { alignment: a.alignment, corridor: a.corridor, designSpeed: a.designSpeed, speedUnit: a.speedUnit, emaxPercent: a.emaxPercent, acceptedChecks: a.acceptedChecks.map(({ id, reason }) => ({ id, reason })) };
}

/** The planner's alternative editor (read only for everyone else): map, PI table, elements, checks, totals, trade-off. */
export function AlternativeEditor({ alternative, projectId, projectName, layers, basemapStyleUrl, crsDefinition, editable }: EditorProps) {
  const crs = useMemo(() => createWorkingCrs(crsDefinition), [crsDefinition]);
  const editor = useAlternativeEditor(useMemo(() => draftOf(alternative), [alternative]), editable);
  const autosave = useAutosave(alternative.id, alternative.version, editor.committed, editable);
  const preview = usePreview(alternative.id, editor.draft, editor.live, autosave.state.version);
  const [selected, setSelected] = useState<number | null>(null);
  const edits = useDraftEdits(editor, selected, setSelected, editable);
  const units = editor.draft.alignment.units;
  const result = preview.result;
  const overlay = useMemo(() => (result ? toOverlayData({ ...result.outlines, centerline: result.centerline }, crs) : EMPTY_OVERLAY), [result, crs]);
  const points = useMemo<Xy[]>(() => editor.draft.alignment.points.map((p) => [p.x, p.y]), [editor.draft.alignment]);
  const tableActions = useMemo<PiTableActions>(() => ({
    onMove: (i, x, y) => edits.move(i, [x, y]),
    onKind: edits.setKind,
    onCurve: edits.setCurveAt,
    onDelete: edits.remove,
    onSelect: setSelected,
  }), [edits]);
  const summary = result?.summary ?? alternative.summary ?? null;
  // The preview reviews checks against the saved acceptances; show the draft's own at once.
  const checks = useMemo(() => (result ? applyCheckAcceptances(result.checks.map(({ accepted: _, ...c }) => c), editor.draft.acceptedChecks).checks : []), [result, editor.draft.acceptedChecks]);

  return (
    <div className="space-y-6">
      <EditorHeader alternative={alternative} projectId={projectId} projectName={projectName} editable={editable} editor={editor} save={autosave.state} onRetry={() => void autosave.flush()} />
      <EstimateNotice />
      <div className="grid gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <Card title="Map">
          <AlternativeEditorMap layers={layers} basemapStyleUrl={basemapStyleUrl} metric={units === "m"} crs={crs} points={points} overlay={overlay} colour={alternative.colour}
            editable={editable} selected={selected} onSelect={setSelected}
            onDrag={(i, xy) => edits.move(i, xy, true)} onDragEnd={() => editor.endDrag()} onNudge={edits.nudge} onDelete={edits.remove} onAddPoint={edits.add} />
        </Card>
        <Card title="Land take">
          {summary ? <TakeTotals summary={summary} units={units} pending={preview.pending} /> : <p className="text-sm text-ink-soft">Computing…</p>}
        </Card>
      </div>
      <Card title="Points of intersection">
        <PiTable alignment={editor.draft.alignment} curves={result?.geometry.curves ?? []} selected={selected} editable={editable} error={preview.error} actions={tableActions} />
      </Card>
      <Card title="Computed elements">
        {result ? <CurveElements curves={result.geometry.curves} stations={result.geometry.stations} length={result.geometry.length} unit={lengthUnitLabel(units)} /> : <p className="text-sm text-ink-soft">Computing…</p>}
      </Card>
      <div className="grid gap-6 lg:grid-cols-2">
        <Card title="Design checks">
          {result ? <DesignChecksPanel checks={checks} editable={editable} onAccept={edits.accept} onWithdraw={edits.withdraw} /> : <p className="text-sm text-ink-soft">Computing…</p>}
        </Card>
        <Card title="Corridor and design">
          <DesignSettings draft={editor.draft} unit={lengthUnitLabel(units)} editable={editable} onChange={editor.commit} />
        </Card>
      </div>
      <Card title="Curve trade-off">
        <CurveTradeoffPanel alternativeId={alternative.id} draft={editor.draft} piIndex={selected} editable={editable} flush={autosave.flush} onApply={edits.applySweep} />
      </Card>
      <Card title="Parcels affected">
        <AffectedParcels parcels={result?.parcels ?? []} areaUnit={areaUnitLabel(units)} />
      </Card>
    </div>
  );
}
