import { useState } from "react";
import { useNavigate } from "react-router";
import { createWorkingCrs } from "~/components/map/working-crs";
import { Button } from "~/components/ui/button";
import { Dialog } from "~/components/ui/dialog";
import { Field, SelectField } from "~/components/ui/field";
import type { AlignmentInput } from "~/geometry/alignment-types";
import type { CorridorInput } from "~/geometry/take-types";
import { createAlternativeRequest } from "./api-client";
import type { Units } from "./format";

export interface StartingPoint {
  id: number;
  name: string;
  alignment: AlignmentInput;
  corridor: CorridorInput;
}

/** Right-of-way for a fresh alternative: 15 m (50 ft) each side, 3 m (10 ft) easement (common practice for a two-lane road). */
const FRESH_CORRIDOR: Record<Units, CorridorInput> = { m: { left: 15, right: 15, easement: 3 }, ft: { left: 50, right: 50, easement: 10 }, usft: { left: 50, right: 50, easement: 10 } };

/**
 * A straight two-point line west to east through the middle of the fabric's extent (WGS84 box),
 * in the working CRS: a start the planner then shapes.
 */
function straightLine(units: Units, bbox: [number, number, number, number], crsDefinition: string): AlignmentInput {
  const crs = createWorkingCrs(crsDefinition);
  const midLat = (bbox[1] + bbox[3]) / 2;
  const span = bbox[2] - bbox[0];
  const ends = [crs.toWorking([bbox[0] + span * 0.2, midLat]), crs.toWorking([bbox[2] - span * 0.2, midLat])];
  return { units, startStation: 0, points: ends.map(([x, y]) => ({ x: Math.round(x), y: Math.round(y) })) };
}

/** "New alternative": a name and a start — a copy of an existing alternative or a straight line. */
export function NewAlternativeButton({ projectId, units, existing, fabricBbox, crsDefinition }: { projectId: number; units: Units; existing: StartingPoint[]; fabricBbox: [number, number, number, number] | null; crsDefinition: string | null }) {
  const navigate = useNavigate();
  const [open, setOpen] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const canDrawLine = fabricBbox !== null && crsDefinition !== null;
  const options = [...existing.map((a) => ({ value: String(a.id), label: `A copy of ${a.name}` })), ...(canDrawLine ? [{ value: "line", label: "A straight line across the parcel fabric" }] : [])];
  if (options.length === 0) return <p className="text-sm text-ink-soft">Upload a parcel layer first: a new alternative starts on the fabric.</p>;

  const submit = async (form: FormData) => {
    const name = String(form.get("name") ?? "").trim();
    const from = String(form.get("from"));
    const copy = existing.find((a) => String(a.id) === from);
    const start = copy ? { alignment: copy.alignment, corridor: copy.corridor } : { alignment: straightLine(units, fabricBbox!, crsDefinition!), corridor: FRESH_CORRIDOR[units] };
    setBusy(true);
    setError(null);
    const outcome = await createAlternativeRequest(projectId, { name, ...start }).catch(() => null);
    setBusy(false);
    if (outcome?.ok) navigate(`/projects/${projectId}/alternatives/${outcome.value.id}`);
    else setError(outcome?.message ?? "The server could not be reached.");
  };
  return (
    <>
      <Button onClick={() => setOpen(true)}>New alternative</Button>
      <Dialog open={open} onClose={() => setOpen(false)} title="New alternative">
        <form className="space-y-4" onSubmit={(e) => { e.preventDefault(); void submit(new FormData(e.currentTarget)); }}>
          <Field label="Name of the alternative" name="name" required maxLength={120} />
          <SelectField label="Start from" name="from" options={options} defaultValue={options[0]!.value} />
          {error && <p role="alert" className="text-sm font-semibold text-danger">{error}</p>}
          <div className="flex justify-end gap-2">
            <Button variant="secondary" onClick={() => setOpen(false)}>Cancel</Button>
            <Button type="submit" disabled={busy}>{busy ? "Creating…" : "Create and open"}</Button>
          </div>
        </form>
      </Dialog>
    </>
  );
}
