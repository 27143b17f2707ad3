import { useMemo } from "react";
import { formatStation, stationStyleForUnits } from "~/geometry/stations";
import type { CorridorInput, CorridorWidthRange } from "~/geometry/take-types";
import { formatNumber, lengthUnitLabel, type Units } from "./format";
import { NewRangeRow, RangeRow } from "./width-range-row";
import { checkWidthRanges, MAX_RANGES, parseRangeText, sameRange, sortRanges, type RangeText, type StationExtent } from "./width-ranges";

/**
 * The corridor's width ranges as a table: each range's stations, half-widths (blank = the base)
 * and transition. Every edit is checked first and made as one change of the whole list, so undo
 * takes it back and the preview recomputes corridor and takes.
 */
export function WidthRangesEditor({ corridor, units, extent, equations, editable, onChange }: {
  corridor: CorridorInput;
  units: Units;
  /** The alignment's internal stations; null until it has computed. */
  extent: StationExtent | null;
  /** The alignment has station equations (range stations are before them). */
  equations: boolean;
  editable: boolean;
  onChange: (ranges: CorridorWidthRange[]) => void;
}) {
  const ranges = useMemo(() => corridor.ranges ?? [], [corridor.ranges]);
  const style = stationStyleForUnits(units);
  const unit = lengthUnitLabel(units);
  const base = useMemo(() => ({ left: corridor.left, right: corridor.right }), [corridor.left, corridor.right]);
  const problems = useMemo(() => checkWidthRanges(ranges, base, extent, style), [ranges, base, extent, style]);
  const example = formatStation(extent?.start ?? 0, style);

  const tryCommit = (next: CorridorWidthRange[], at: number): string | null => {
    if (!extent) return "Wait for the alignment to compute: ranges are checked against its stations.";
    const message = checkWidthRanges(next, base, extent, style)[at];
    if (message) return message;
    onChange(sortRanges(next));
    return null;
  };
  const commitAt = (i: number, text: RangeText): string | null => {
    const parsed = parseRangeText(text, style, ranges[i]);
    if ("error" in parsed) return parsed.error;
    if (sameRange(ranges[i], parsed.range)) return null;
    return tryCommit(ranges.map((r, k) => (k === i ? parsed.range : r)), i);
  };
  const add = (text: RangeText): string | null => {
    if (ranges.length >= MAX_RANGES) return `An alternative can have at most ${MAX_RANGES} width ranges.`;
    const parsed = parseRangeText(text, style);
    return "error" in parsed ? parsed.error : tryCommit([...ranges, parsed.range], ranges.length);
  };

  return (
    <div className="space-y-2" data-testid="width-ranges">
      <p className="text-sm text-ink-soft">
        Inside a range its half-widths replace the base ({formatNumber(base.left, 3)} left, {formatNumber(base.right, 3)} right, {unit}); over the transition
        before and after it the width changes linearly from the base. Ranges may touch but not overlap, transitions included.
        {extent && ` The alignment runs from ${formatStation(extent.start, style)} to ${formatStation(extent.end, style)}`}
        {extent && (equations ? " (stations before any station equation)." : ".")}
      </p>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-sm" aria-label="Right-of-way width ranges">
          <thead>
            <tr className="border-b border-rule-strong text-left text-label text-ink-soft">
              {["Range", "From station", "To station", `Left (${unit})`, `Right (${unit})`, `Transition (${unit})`].map((h) => <th key={h} scope="col" className="px-2 py-2 font-semibold">{h}</th>)}
              <th scope="col" className="px-2 py-2"><span className="sr-only">Actions</span></th>
            </tr>
          </thead>
          <tbody>
            {ranges.length === 0 && <tr><td colSpan={7} className="px-2 py-2 text-ink-soft">No ranges: the base widths apply along the whole line.</td></tr>}
            {ranges.map((r, i) => editable ? (
              <RangeRow key={i} label={`Range ${i + 1}`} unit={unit} base={base} range={r} style={style} problem={problems[i] ?? null} example={example}
                commit={(text) => commitAt(i, text)} onRemove={() => onChange(ranges.filter((_, k) => k !== i))} />
            ) : (
              <tr key={i} className="border-b border-rule last:border-0 tabular-nums">
                <th scope="row" className="px-2 py-1 text-left font-semibold">Range {i + 1}</th>
                <td className="px-2 py-1 font-mono">{formatStation(r.fromStation, style)}</td>
                <td className="px-2 py-1 font-mono">{formatStation(r.toStation, style)}</td>
                <td className="px-2 py-1 text-right">{r.left === undefined ? "base" : formatNumber(r.left, 3)}</td>
                <td className="px-2 py-1 text-right">{r.right === undefined ? "base" : formatNumber(r.right, 3)}</td>
                <td className="px-2 py-1 text-right">{formatNumber(r.transition, 3)}</td>
                <td />
              </tr>
            ))}
          </tbody>
          {editable && (
            <tfoot>
              <NewRangeRow unit={unit} base={base} commit={add} disabled={!extent || ranges.length >= MAX_RANGES} example={example} />
            </tfoot>
          )}
        </table>
      </div>
    </div>
  );
}
