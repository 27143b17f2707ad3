import { useMemo, useState } from "react";
import { Form, useNavigation } from "react-router";
import { selectByStationRange } from "~/calculations/parcel-assignment";
import { AssignmentMap } from "~/components/map/assignment-map";
import type { ParcelCaseDrawing } from "~/components/map/parcel-case-map";
import type { MapLayerInfo } from "~/components/map/project-map";
import { Button } from "~/components/ui/button";
import { SelectField } from "~/components/ui/field";
import type { Units } from "../parcel-work/figures";
import { AssignmentTable, type AssignableCase } from "./assignment-table";
import { StationRangePicker } from "./station-range-picker";

/** Agent colours on the map and in the table; unassigned parcels stay grey. */
const AGENT_COLOURS = ["#1864ab", "#e67700", "#7048e8", "#2b8a3e", "#c2255c", "#0b7285", "#5c940d", "#862e9c"];
export const UNASSIGNED_COLOUR = "#adb5bd";

export interface BoardProps {
  cases: AssignableCase[];
  agents: { email: string; name: string }[];
  units: Units;
  editable: boolean;
  map: { drawing: ParcelCaseDrawing; layers: MapLayerInfo[]; basemapStyleUrl: string } | null;
}

/** Select parcels (table, map or station range) and give them to an agent, or split them evenly. */
export function AssignmentBoard({ cases, agents, units, editable, map }: BoardProps) {
  const [selected, setSelected] = useState<Set<string>>(new Set());
  const busy = useNavigation().state === "submitting";
  const agentColour = useMemo(() => new Map(agents.map((a, i) => [a.email, AGENT_COLOURS[i % AGENT_COLOURS.length]!])), [agents]);
  const colourOf = useMemo(() => Object.fromEntries(cases.map((c) => [c.parcelId, c.agentEmail ? (agentColour.get(c.agentEmail) ?? UNASSIGNED_COLOUR) : UNASSIGNED_COLOUR])), [cases, agentColour]);
  const toggle = (id: string) => setSelected((s) => { const n = new Set(s); if (n.has(id)) n.delete(id); else n.add(id); return n; });
  const ids = [...selected].join("\n");
  return (
    <div className="space-y-4">
      {map && <AssignmentMap {...map} metric={units === "m"} colourOf={colourOf} selected={[...selected]} onToggle={editable ? toggle : () => undefined} />}
      <ul className="flex flex-wrap gap-3 text-xs" aria-label="Agents">
        {agents.map((a) => <li key={a.email} className="flex items-center gap-1"><span className="inline-block h-3 w-3 rounded-sm" style={{ background: agentColour.get(a.email) }} />{a.name}</li>)}
        <li className="flex items-center gap-1"><span className="inline-block h-3 w-3 rounded-sm" style={{ background: UNASSIGNED_COLOUR }} />Unassigned</li>
      </ul>
      {editable && (
        <div className="flex flex-wrap items-end gap-4 rounded-md border border-rule p-3">
          <StationRangePicker units={units} onPick={(from, to) => setSelected(new Set(selectByStationRange(cases, from, to).map((c) => c.parcelId)))} />
          <Button variant="quiet" onClick={() => setSelected(new Set(cases.map((c) => c.parcelId)))}>Select all</Button>
          <Button variant="quiet" onClick={() => setSelected(new Set(cases.filter((c) => !c.agentEmail).map((c) => c.parcelId)))}>Select unassigned</Button>
          <Button variant="quiet" onClick={() => setSelected(new Set())}>Clear</Button>
          <span className="text-sm" data-testid="selected-count">{selected.size} selected</span>
        </div>
      )}
      {editable && (
        <div className="flex flex-wrap items-end gap-4">
          <Form method="post" className="flex items-end gap-2">
            <input type="hidden" name="intent" value="assign" />
            <input type="hidden" name="parcelIds" value={ids} />
            <SelectField label="Give the selected parcels to" name="agentEmail" options={[...agents.map((a) => ({ value: a.email, label: a.name })), { value: "", label: "Nobody (unassign)" }]} />
            <Button type="submit" disabled={busy || selected.size === 0}>Assign {selected.size}</Button>
          </Form>
          <Form method="post">
            <input type="hidden" name="intent" value="split" />
            <input type="hidden" name="parcelIds" value={ids} />
            <Button type="submit" variant="secondary" disabled={busy || agents.length === 0}>
              {selected.size ? `Split the ${selected.size} selected evenly` : "Split all evenly"} among {agents.length} agents
            </Button>
          </Form>
        </div>
      )}
      <AssignmentTable cases={cases} units={units} selected={selected} onToggle={editable ? toggle : undefined} colourOf={colourOf} />
    </div>
  );
}
