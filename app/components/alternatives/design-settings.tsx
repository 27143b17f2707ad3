import { useId, type ReactNode } from "react";
import { EMAX_OPTIONS_PERCENT } from "~/geometry/side-friction";
import type { AlternativeDraft, SpeedUnit } from "./api-types";
import { NumberInput } from "./number-input";

/** Base right-of-way half-widths, easement width, design speed and emax: each change is one edit. */
export function DesignSettings({ draft, unit, editable, onChange }: { draft: AlternativeDraft; unit: string; editable: boolean; onChange: (next: AlternativeDraft) => void }) {
  const id = useId();
  const corridor = (patch: Partial<AlternativeDraft["corridor"]>) => onChange({ ...draft, corridor: { ...draft.corridor, ...patch } });
  const field = (label: string, control: ReactNode, hint?: string) => (
    <div className="space-y-1">
      <span className="block text-label font-semibold">{label}</span>
      {control}
      {hint && <span className="block text-xs text-ink-soft">{hint}</span>}
    </div>
  );
  return (
    <div className="grid grid-cols-2 gap-4" data-testid="design-settings">
      {field(`Left half-width (${unit})`, <NumberInput label={`Left right-of-way half-width (${unit})`} value={draft.corridor.left} min={0} max={10000} disabled={!editable} onCommit={(v) => corridor({ left: v })} />, "Looking ahead along stationing")}
      {field(`Right half-width (${unit})`, <NumberInput label={`Right right-of-way half-width (${unit})`} value={draft.corridor.right} min={0} max={10000} disabled={!editable} onCommit={(v) => corridor({ right: v })} />)}
      {field(`Easement width (${unit})`, <NumberInput label={`Construction easement width (${unit})`} value={draft.corridor.easement ?? 0} min={0} max={10000} disabled={!editable} onCommit={(v) => corridor({ easement: v })} />, "Beyond each right-of-way line; 0 for none")}
      {field(`Design speed (${draft.speedUnit})`, <NumberInput label={`Design speed (${draft.speedUnit})`} value={draft.designSpeed} min={1} max={400} disabled={!editable} onCommit={(v) => onChange({ ...draft, designSpeed: v })} />)}
      <div className="space-y-1">
        <label htmlFor={`${id}-speed-unit`} className="block text-label font-semibold">Speed unit</label>
        <select id={`${id}-speed-unit`} value={draft.speedUnit} disabled={!editable} onChange={(e) => onChange({ ...draft, speedUnit: e.target.value as SpeedUnit })} className="w-full rounded-control border border-rule-strong bg-sheet px-2 py-1 text-sm">
          <option value="km/h">km/h</option>
          <option value="mph">mph</option>
        </select>
      </div>
      <div className="space-y-1">
        <label htmlFor={`${id}-emax`} className="block text-label font-semibold">Maximum superelevation</label>
        <select id={`${id}-emax`} value={draft.emaxPercent} disabled={!editable} onChange={(e) => onChange({ ...draft, emaxPercent: Number(e.target.value) })} className="w-full rounded-control border border-rule-strong bg-sheet px-2 py-1 text-sm">
          {EMAX_OPTIONS_PERCENT.map((e) => <option key={e} value={e}>{e} %</option>)}
        </select>
      </div>
      <p className="col-span-full text-xs text-ink-soft">These are the base widths; where the right-of-way is wider or narrower over a stretch, set it under “Right-of-way width by station”.</p>
    </div>
  );
}
