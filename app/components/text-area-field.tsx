import type { TextareaHTMLAttributes } from "react";

/** A labelled multi-line input with its hint and errors wired by id for screen readers. */
export function TextAreaField({ label, errors, hint, id, ...input }: TextareaHTMLAttributes<HTMLTextAreaElement> & { id: string; label: string; errors?: string[] | null; hint?: string }) {
  const errorId = `${id}-error`;
  const hintId = `${id}-hint`;
  return (
    <div>
      <label htmlFor={id} className="mb-1 block text-sm font-medium text-ink-800">
        {label}
      </label>
      <textarea
        id={id}
        rows={3}
        {...input}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={[hint ? hintId : "", errors?.length ? errorId : ""].filter(Boolean).join(" ") || undefined}
        className="block w-full rounded-md border border-ink-200 bg-white px-3 py-2 text-sm text-ink-900 shadow-xs placeholder:text-ink-400 aria-invalid:border-danger-600"
      />
      {hint ? (
        <p id={hintId} className="mt-1 text-xs text-ink-600">
          {hint}
        </p>
      ) : null}
      {errors?.length ? (
        <p id={errorId} className="mt-1 text-sm text-danger-600" role="alert">
          {errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}
