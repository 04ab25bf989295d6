import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes } from "react";

type TFieldProps = { label: string; name: string; error?: string; hint?: ReactNode };

const inputClass =
  "mt-1 block w-full rounded-md border border-slate-300 bg-white px-3 py-2 text-base shadow-sm aria-[invalid=true]:border-red-600";

/** "Currency must be …", "Reason: say why …": a message in lower case is read after the field's label. */
function withLabel(label: string, error: string): string {
  if (!/^[a-z]/.test(error)) return error;
  return /^(is|are|must|cannot|can|should|has|have|needs|was|were|may|does)\b/.test(error) ? `${label} ${error}` : `${label}: ${error}`;
}

function FieldShell({ label, name, error, hint, children }: TFieldProps & { children: ReactNode }) {
  return (
    <div>
      <label htmlFor={name} className="block text-sm font-semibold text-slate-800">
        {label}
      </label>
      {children}
      {hint && !error ? <p id={`${name}-hint`} className="mt-1 text-xs text-slate-600">{hint}</p> : null}
      {error ? (
        <p id={`${name}-error`} role="alert" className="mt-1 text-sm text-red-700">
          {withLabel(label, error)}
        </p>
      ) : null}
    </div>
  );
}

export function TextField({ label, name, error, hint, ...input }: TFieldProps & InputHTMLAttributes<HTMLInputElement>) {
  return (
    <FieldShell label={label} name={name} error={error} hint={hint}>
      <input
        id={name}
        name={name}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${name}-error` : hint ? `${name}-hint` : undefined}
        className={inputClass}
        {...input}
      />
    </FieldShell>
  );
}

export function SelectField({
  label,
  name,
  error,
  hint,
  options,
  ...select
}: TFieldProps & SelectHTMLAttributes<HTMLSelectElement> & { options: readonly { value: string; label: string }[] }) {
  return (
    <FieldShell label={label} name={name} error={error} hint={hint}>
      <select
        id={name}
        name={name}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${name}-error` : undefined}
        className={inputClass}
        {...select}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </FieldShell>
  );
}
