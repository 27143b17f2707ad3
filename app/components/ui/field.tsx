import { useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes } from "react";

type FieldProps = { label: string; error?: string; hint?: ReactNode };

const CONTROL =
  "block w-full rounded-control border border-rule-strong bg-sheet px-3 py-2 text-sm text-ink placeholder:text-ink-soft/60 aria-[invalid=true]:border-danger";

function FieldFrame({ id, label, error, hint, children }: FieldProps & { id: string; children: ReactNode }) {
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-label font-semibold text-ink">
        {label}
      </label>
      {children}
      {hint && !error && <p className="text-xs text-ink-soft">{hint}</p>}
      {error && (
        <p id={`${id}-error`} className="text-xs font-semibold text-danger" role="alert">
          {error}
        </p>
      )}
    </div>
  );
}

/** A labelled text input with its error message wired to aria-describedby. */
export function Field({ label, error, hint, id: givenId, ...input }: FieldProps & InputHTMLAttributes<HTMLInputElement>) {
  const autoId = useId();
  const id = givenId ?? autoId;
  return (
    <FieldFrame id={id} label={label} error={error} hint={hint}>
      <input id={id} aria-invalid={error ? true : undefined} aria-describedby={error ? `${id}-error` : undefined} className={CONTROL} {...input} />
    </FieldFrame>
  );
}

export function SelectField({
  label,
  error,
  hint,
  options,
  id: givenId,
  ...select
}: FieldProps & SelectHTMLAttributes<HTMLSelectElement> & { options: { value: string; label: string }[] }) {
  const autoId = useId();
  const id = givenId ?? autoId;
  return (
    <FieldFrame id={id} label={label} error={error} hint={hint}>
      <select id={id} aria-invalid={error ? true : undefined} className={CONTROL} {...select}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </FieldFrame>
  );
}
