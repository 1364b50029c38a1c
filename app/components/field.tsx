import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes } from "react";

type Common = { label: string; errors?: string[] | null; hint?: ReactNode };

const inputClass =
  "block w-full rounded-md border border-ink-200 bg-white px-3 py-2 text-sm text-ink-900 shadow-xs placeholder:text-ink-400 aria-invalid:border-danger-600";

function Errors({ id, errors }: { id: string; errors?: string[] | null }) {
  if (!errors?.length) return null;
  return (
    <p id={id} className="mt-1 text-sm text-danger-600" role="alert">
      {errors.join(" ")}
    </p>
  );
}

/** A labelled input with its hint and errors wired by id for screen readers. */
export function Field({ label, errors, hint, id, ...input }: Common & InputHTMLAttributes<HTMLInputElement> & { id: string }) {
  const errorId = `${id}-error`;
  const hintId = `${id}-hint`;
  return (
    <div>
      <label htmlFor={id} className="mb-1 block text-sm font-medium text-ink-800">
        {label}
      </label>
      <input
        id={id}
        {...input}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={[hint ? hintId : "", errors?.length ? errorId : ""].filter(Boolean).join(" ") || undefined}
        className={inputClass}
      />
      {hint ? (
        <p id={hintId} className="mt-1 text-xs text-ink-600">
          {hint}
        </p>
      ) : null}
      <Errors id={errorId} errors={errors} />
    </div>
  );
}

export function SelectField({
  label,
  errors,
  hint,
  id,
  options,
  ...select
}: Common & SelectHTMLAttributes<HTMLSelectElement> & { id: string; options: { value: string; label: string }[] }) {
  const errorId = `${id}-error`;
  return (
    <div>
      <label htmlFor={id} className="mb-1 block text-sm font-medium text-ink-800">
        {label}
      </label>
      <select id={id} {...select} aria-invalid={errors?.length ? true : undefined} aria-describedby={errors?.length ? errorId : undefined} className={inputClass}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      {hint ? <p className="mt-1 text-xs text-ink-600">{hint}</p> : null}
      <Errors id={errorId} errors={errors} />
    </div>
  );
}

export function FormErrors({ errors }: { errors?: string[] | null }) {
  if (!errors?.length) return null;
  return (
    <div role="alert" className="rounded-md border border-danger-600/30 bg-danger-100 px-3 py-2 text-sm text-danger-600">
      {errors.join(" ")}
    </div>
  );
}
