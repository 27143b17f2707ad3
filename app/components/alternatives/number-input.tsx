import { useEffect, useState } from "react";

/**
 * A number typed in a table cell or form: it commits on Enter or when focus leaves, Escape puts
 * back the stored value, and text that is not a number (or is out of range) is refused visibly.
 */
export function NumberInput({ label, value, onCommit, min, max, disabled, className = "", step = "any" }: {
  label: string;
  value: number;
  onCommit: (value: number) => void;
  min?: number;
  max?: number;
  disabled?: boolean;
  className?: string;
  step?: string;
}) {
  const [text, setText] = useState(String(value));
  const [invalid, setInvalid] = useState(false);
  useEffect(() => {
    setText(String(value));
    setInvalid(false);
  }, [value]);
  const commit = () => {
    const n = Number(text.trim());
    const ok = text.trim() !== "" && Number.isFinite(n) && (min === undefined || n >= min) && (max === undefined || n <= max);
    setInvalid(!ok);
    if (ok && n !== value) onCommit(n);
  };
  return (
    <input
      type="number"
      step={step}
      inputMode="decimal"
      aria-label={label}
      aria-invalid={invalid || undefined}
      title={invalid ? `Enter a number${min !== undefined ? ` of at least ${min}` : ""}${max !== undefined ? ` up to ${max}` : ""}` : undefined}
      value={text}
      disabled={disabled}
      onChange={(e) => setText(e.target.value)}
      onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === "Enter") commit();
        if (e.key === "Escape") {
          setText(String(value));
          setInvalid(false);
        }
      }}
      className={`w-full rounded-control border border-rule-strong bg-sheet px-2 py-1 text-right text-sm tabular-nums aria-[invalid=true]:border-danger disabled:border-transparent disabled:bg-transparent ${className}`}
    />
  );
}
