import { useEffect, useId, useState } from "react";
import { Button } from "~/components/ui/button";
import type { StationStyle } from "~/geometry/stations";
import type { CorridorWidthRange } from "~/geometry/take-types";
import { EMPTY_RANGE_TEXT, rangeToText, type RangeText } from "./width-ranges";

/** What a row needs to draw its fields; `commit` answers the refusal message, or null once the edit is made. */
interface RowProps {
  label: string;
  unit: string;
  base: { left: number; right: number };
  commit: (text: RangeText) => string | null;
}

const FIELDS: { key: keyof RangeText; name: (unit: string) => string; station?: boolean }[] = [
  { key: "from", name: () => "from station", station: true },
  { key: "to", name: () => "to station", station: true },
  { key: "left", name: (u) => `left half-width (${u})` },
  { key: "right", name: (u) => `right half-width (${u})` },
  { key: "transition", name: (u) => `transition (${u})` },
];

/** The five typed cells of a range; Enter commits, Escape puts back what was there. */
function RangeCells({ label, unit, base, text, setText, invalid, messageId, onEnter, onEscape, example }: Omit<RowProps, "commit"> & {
  text: RangeText;
  setText: (t: RangeText) => void;
  invalid: boolean;
  messageId: string;
  onEnter: () => void;
  onEscape: () => void;
  example: string;
}) {
  return FIELDS.map((f) => (
    <td key={f.key} className="px-1 py-1">
      <input
        type="text"
        inputMode="decimal"
        aria-label={`${label} ${f.name(unit)}`}
        aria-invalid={invalid || undefined}
        aria-describedby={invalid ? messageId : undefined}
        value={text[f.key]}
        placeholder={f.station ? example : f.key === "transition" ? "0" : `base ${f.key === "left" ? base.left : base.right}`}
        onChange={(e) => setText({ ...text, [f.key]: e.target.value })}
        onKeyDown={(e) => {
          if (e.key === "Enter") {
            e.preventDefault();
            onEnter();
          } else if (e.key === "Escape") onEscape();
        }}
        className={`w-full rounded-control border border-rule-strong bg-sheet px-2 py-1 text-sm tabular-nums aria-[invalid=true]:border-danger ${f.station ? "min-w-28 font-mono" : "min-w-16 text-right"}`}
      />
    </td>
  ));
}

function MessageRow({ id, message, alert }: { id: string; message: string | null; alert: boolean }) {
  if (!message) return null;
  return (
    <tr>
      <td colSpan={7} className="px-2 pb-2">
        <p id={id} role={alert ? "alert" : undefined} className="text-xs font-semibold text-danger">{message}</p>
      </td>
    </tr>
  );
}

/** A stored range: edits commit when Enter is pressed or focus leaves the row; a refused edit stays typed with its message. */
export function RangeRow({ label, unit, base, commit, range, style, problem, onRemove, example }: RowProps & {
  range: CorridorWidthRange;
  style: StationStyle;
  problem: string | null;
  onRemove: () => void;
  example: string;
}) {
  const id = useId();
  const [text, setText] = useState(() => rangeToText(range, style));
  const [refused, setRefused] = useState<string | null>(null);
  useEffect(() => {
    setText(rangeToText(range, style));
    setRefused(null);
  }, [range, style]);
  const tryCommit = () => setRefused(commit(text));
  const message = refused ?? problem;
  return (
    <>
      <tr className="border-b border-rule last:border-0" onBlur={(e) => {
        if (!e.currentTarget.contains(e.relatedTarget as Node | null)) tryCommit();
      }}>
        <th scope="row" className="px-2 py-1 text-left font-semibold whitespace-nowrap">{label}</th>
        <RangeCells label={label} unit={unit} base={base} text={text} setText={setText} invalid={message !== null} messageId={id} onEnter={tryCommit} example={example}
          onEscape={() => { setText(rangeToText(range, style)); setRefused(null); }} />
        <td className="px-1 py-1">
          <button type="button" onClick={onRemove} aria-label={`Remove ${label.toLowerCase()}`} className="rounded-control px-2 py-1 text-sm font-semibold text-danger hover:bg-danger-tint">Remove</button>
        </td>
      </tr>
      <MessageRow id={id} message={message} alert={refused !== null} />
    </>
  );
}

/** The empty row at the foot of the table: "Add range" (or Enter) checks it and adds it as one edit. */
export function NewRangeRow({ unit, base, commit, disabled, example }: Omit<RowProps, "label"> & { disabled: boolean; example: string }) {
  const id = useId();
  const [text, setText] = useState<RangeText>(EMPTY_RANGE_TEXT);
  const [refused, setRefused] = useState<string | null>(null);
  const add = () => {
    const message = commit(text);
    setRefused(message);
    if (message === null) setText(EMPTY_RANGE_TEXT);
  };
  return (
    <>
      <tr className="border-t border-rule-strong">
        <th scope="row" className="px-2 py-1 text-left font-semibold whitespace-nowrap">New</th>
        <RangeCells label="New range" unit={unit} base={base} text={text} setText={setText} invalid={refused !== null} messageId={id} onEnter={add} example={example}
          onEscape={() => { setText(EMPTY_RANGE_TEXT); setRefused(null); }} />
        <td className="px-1 py-1">
          <Button variant="secondary" className="whitespace-nowrap" disabled={disabled} onClick={add}>Add range</Button>
        </td>
      </tr>
      <MessageRow id={id} message={refused} alert />
    </>
  );
}
