import { useMemo, useState } from "react";
import { AlternativeEditorMap } from "~/components/map/alternative-editor-map";
import { EMPTY_OVERLAY, toOverlayData } from "~/components/map/overlay-data";
import type { MapLayerInfo } from "~/components/map/project-map";
import { createWorkingCrs, type Xy } from "~/components/map/working-crs";
import { Card } from "~/components/ui/card";
import { applyCheckAcceptances } from "~/calculations/check-acceptances";
import { withSavedStamps } from "./acceptance-stamps";
import { AffectedParcels } from "./affected-parcels";
import type { CorridorInput, CorridorWidthRange } from "~/geometry/take-types";
import type { AlternativeDraft, AlternativeJson, PreviewResult } from "./api-types";
import { CurveElements } from "./curve-elements";
import { CurveTradeoffPanel } from "./curve-tradeoff-panel";
import { DesignChecksPanel } from "./design-checks-panel";
import { DesignSettings } from "./design-settings";
import { EditorHeader } from "./editor-header";
import { EstimateNotice } from "./estimate-notice";
import { areaUnitLabel, lengthUnitLabel } from "./format";
import { PiTable, type PiTableActions } from "./pi-table";
import type { RuleOverrides } from "./rule-sources";
import { TakeRulesCard } from "./take-rules-card";
import { TakeTotals } from "./take-totals";
import { useAlternativeEditor } from "./use-alternative-editor";
import { useAutosave } from "./use-autosave";
import { useDraftEdits } from "./use-draft-edits";
import { usePreview } from "./use-preview";
import { useValueAfterPaint } from "./use-value-after-paint";
import type { StationExtent } from "./width-ranges";
import { WidthRangesEditor } from "./width-ranges-editor";

export interface EditorProps {
  alternative: AlternativeJson;
  projectId: number;
  projectName: string;
  layers: MapLayerInfo[];
  basemapStyleUrl: string;
  crsDefinition: string;
  /** The project's own take rules (null: the defaults apply), under this alternative's overrides. */
  projectRules: RuleOverrides | null;
  editable: boolean;
}

function draftOf(a: AlternativeJson): AlternativeDraft {
  const acceptedChecks = a.acceptedChecks.map(({ id, reason, acceptedBy, acceptedAt }) => ({ id, reason, ...(acceptedBy ? { acceptedBy } : {}), ...(acceptedAt ? { acceptedAt } : {}) }));
  return { alignment: a.alignment, corridor: a.corridor, rules: a.rules ?? {}, designSpeed: a.designSpeed, speedUnit: a.speedUnit, emaxPercent: a.emaxPercent, acceptedChecks };
}

/** The planner's alternative editor (read only for everyone else): map, PI table, elements, checks, totals, trade-off. */
export function AlternativeEditor({ alternative, projectId, projectName, layers, basemapStyleUrl, crsDefinition, projectRules, editable }: EditorProps) {
  const crs = useMemo(() => createWorkingCrs(crsDefinition), [crsDefinition]);
  const editor = useAlternativeEditor(useMemo(() => draftOf(alternative), [alternative]), editable);
  const autosave = useAutosave(alternative.id, alternative.version, editor.committed, editable);
  const preview = usePreview(alternative.id, editor.draft, editor.live, autosave.state.version);
  const [selected, setSelected] = useState<number | null>(null);
  const edits = useDraftEdits(editor, selected, setSelected, editable);
  const units = editor.draft.alignment.units;
  const result = preview.result;
  const overlay = useValueAfterPaint(useMemo(() => (result ? toOverlayData({ ...result.outlines, centerline: result.centerline }, crs) : EMPTY_OVERLAY), [result, crs]));
  const points = useMemo<Xy[]>(() => editor.draft.alignment.points.map((p) => [p.x, p.y]), [editor.draft.alignment]);
  // A typed edit redraws the dashed PI legs together with the corridor it produces, in one map
  // frame (without a GPU each frame costs tens of milliseconds); a drag moves them at once.
  const legAlignment = !editor.live && !preview.error && preview.shownDraft && preview.shownDraft !== editor.draft ? preview.shownDraft.alignment : editor.draft.alignment;
  const legPoints = useValueAfterPaint(useMemo<Xy[]>(() => legAlignment.points.map((p) => [p.x, p.y]), [legAlignment]));
  const tableActions = useMemo<PiTableActions>(() => ({
    onMove: (i, x, y) => edits.move(i, [x, y]),
    onKind: edits.setKind,
    onCurve: edits.setCurveAt,
    onDelete: edits.remove,
    onSelect: setSelected,
    // The curves of the last alignment that computed: the new PI goes on the tangent between them.
    onInsertAfter: (i) => edits.insertAfter(i, preview.error ? [] : (result?.geometry.curves ?? [])),
  }), [edits, result, preview.error]);
  const summary = result?.summary ?? alternative.summary ?? null;
  // The preview reviews checks against the saved acceptances; show the draft's own at once.
  const acceptances = useMemo(() => withSavedStamps(editor.draft.acceptedChecks, autosave.savedAcceptances), [editor.draft.acceptedChecks, autosave.savedAcceptances]);
  const reviewed = useMemo(() => (result ? applyCheckAcceptances(result.checks.map(({ accepted: _, ...c }) => c), acceptances) : { checks: [], stale: [] }), [result, acceptances]);
  const extent = useMemo(() => stationExtentOf(result), [result]);
  const draft = editor.draft;

  return (
    <div className="space-y-6">
      <EditorHeader alternative={alternative} projectId={projectId} projectName={projectName} editable={editable} editor={editor} save={autosave.state} onRetry={() => void autosave.flush()} />
      <EstimateNotice />
      <div className="grid gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <Card title="Map">
          <AlternativeEditorMap layers={layers} basemapStyleUrl={basemapStyleUrl} metric={units === "m"} crs={crs} points={points} legPoints={legPoints} overlay={overlay} colour={alternative.colour}
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
          {result ? <DesignChecksPanel checks={reviewed.checks} stale={reviewed.stale} editable={editable} onAccept={edits.accept} onWithdraw={edits.withdraw} onDropStale={edits.dropAcceptances} /> : <p className="text-sm text-ink-soft">Computing…</p>}
        </Card>
        <Card title="Corridor and design">
          <DesignSettings draft={draft} unit={lengthUnitLabel(units)} editable={editable} onChange={editor.commit} />
        </Card>
      </div>
      <Card title="Right-of-way width by station">
        <WidthRangesEditor corridor={draft.corridor} units={units} extent={extent} equations={(draft.alignment.stationEquations?.length ?? 0) > 0} editable={editable}
          onChange={(ranges) => editor.commit({ ...draft, corridor: withRanges(draft.corridor, ranges) })} />
      </Card>
      <Card title="Take and cost rules">
        <TakeRulesCard units={units} projectRules={projectRules} rules={draft.rules} editable={editable} onChange={(rules) => editor.commit({ ...draft, rules })} />
      </Card>
      <Card title="Curve trade-off">
        <CurveTradeoffPanel alternativeId={alternative.id} draft={editor.draft} piIndex={selected} editable={editable} flush={autosave.flush} onApply={edits.applySweep} />
      </Card>
      <Card title="Parcels affected">
        <AffectedParcels parcels={result?.parcels ?? []} areaUnit={areaUnitLabel(units)} />
      </Card>
    </div>
  );
}

/** The internal stations of the computed alignment's first and last points, or null before it computes. */
function stationExtentOf(result: PreviewResult | null): StationExtent | null {
  const pob = result?.geometry.stations.find((s) => s.label === "POB");
  const poe = result?.geometry.stations.find((s) => s.label === "POE");
  return pob && poe ? { start: pob.station, end: poe.station } : null;
}

/** The corridor with these ranges (none: the key is left out, as a corridor without ranges is stored). */
function withRanges(corridor: CorridorInput, ranges: CorridorWidthRange[]): CorridorInput {
  const { ranges: _, ...rest } = corridor;
  return ranges.length > 0 ? { ...rest, ranges } : rest;
}
