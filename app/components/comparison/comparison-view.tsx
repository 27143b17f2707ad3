import { useCallback, useMemo, useState } from "react";
import { Link } from "react-router";
import { Card } from "~/components/ui/card";
import { EstimateNotice } from "~/components/alternatives/estimate-notice";
import type { AlternativeDraft } from "~/components/alternatives/api-types";
import { areaUnitLabel, lengthUnitLabel } from "~/components/alternatives/format";
import { ComparisonMap } from "~/components/map/comparison-map";
import type { MapLayerInfo } from "~/components/map/project-map";
import { createWorkingCrs } from "~/components/map/working-crs";
import { ComparisonTable } from "./comparison-table";
import type { ComparisonJson } from "./comparison-types";
import { MetricCharts } from "./metric-charts";
import { ParcelMatrixTable } from "./parcel-matrix-table";
import { useAlternativeOutlines } from "./use-alternative-outlines";

export interface ComparisonViewProps {
  project: { id: number; name: string };
  comparison: ComparisonJson;
  /** Each alternative's saved inputs, to draw its outlines. */
  drafts: { id: number; draft: AlternativeDraft }[];
  layers: MapLayerInfo[];
  basemapStyleUrl: string;
  crsDefinition: string | null;
}

/** The comparison page: table, charts per metric, map of every corridor, and the parcel × alternative matrix. */
export function ComparisonView({ project, comparison, drafts, layers, basemapStyleUrl, crsDefinition }: ComparisonViewProps) {
  const { units, alternatives, matrix } = comparison;
  const crs = useMemo(() => (crsDefinition ? createWorkingCrs(crsDefinition) : null), [crsDefinition]);
  const [selected, setSelected] = useState<number | null>(alternatives[0]?.id ?? null);
  const onSelect = useCallback((id: number) => setSelected(id), []);
  const { outlines, errors } = useAlternativeOutlines(drafts, crs);
  const mapped = alternatives.map((a) => ({
    id: a.id, name: a.name, colour: a.colour, overlay: outlines[a.id] ?? null,
    points: (drafts.find((d) => d.id === a.id)?.draft.alignment.points ?? []).map((p) => [p.x, p.y] as [number, number]),
  }));
  return (
    <div className="space-y-6">
      <div className="space-y-1">
        <nav aria-label="Breadcrumb" className="text-sm"><Link to={`/projects/${project.id}`}>{project.name}</Link></nav>
        <h1>Compare alternatives</h1>
      </div>
      <EstimateNotice />
      {alternatives.length === 0 ? (
        <Card><p className="text-sm">This project has no alternatives yet.</p></Card>
      ) : (
        <>
          <Card title="Side by side">
            <ComparisonTable projectId={project.id} units={units} alternatives={alternatives} selected={selected} onSelect={onSelect} />
          </Card>
          <Card title="By metric">
            <MetricCharts alternatives={alternatives} lengthUnit={lengthUnitLabel(units)} areaUnit={areaUnitLabel(units)} />
          </Card>
          <Card title="Map">
            {crs ? (
              <ComparisonMap layers={layers} basemapStyleUrl={basemapStyleUrl} metric={units === "m"} crs={crs} alternatives={mapped} selected={selected} />
            ) : (
              <p className="text-sm">The project has no working coordinate system Takeline knows, so the corridors cannot be drawn.</p>
            )}
            <p className="mt-2 text-xs text-ink-soft">Choose “On map” in the table to show that alternative’s takes.</p>
            {Object.entries(errors).map(([id, message]) => <p key={id} role="alert" className="text-sm text-danger">{alternatives.find((a) => a.id === Number(id))?.name}: {message}</p>)}
          </Card>
          <Card title="Parcels by alternative">
            <ParcelMatrixTable alternatives={alternatives} rows={matrix} areaUnit={areaUnitLabel(units)} />
          </Card>
        </>
      )}
    </div>
  );
}
