import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes, TextareaHTMLAttributes } from "react";
import { StateGlyph } from "./state-glyph";

type Common = { label: string; errors?: string[] | null; hint?: ReactNode };

export const controlClass =
  "block w-full min-h-10 rounded-control border border-rule-strong bg-sheet px-3 py-2 text-base text-ink-900 placeholder:text-graphite-500 aria-invalid:border-danger-700 aria-invalid:bg-danger-100/40";

/**
 * The line under a field where its error appears. It keeps its height when empty, so an error
 * coming or going never moves the controls below it (a click aimed at the button still lands).
 */
function ErrorLine({ id, errors }: { id: string; errors?: string[] | null }) {
  return (
    <div className="mt-1 min-h-5 text-sm text-danger-700">
      {errors?.length ? (
        <p id={id} role="alert" className="flex items-start gap-1.5">
          <StateGlyph state="danger" className="mt-0.5 h-4 w-4" />
          <span>{errors.join(" ")}</span>
        </p>
      ) : null}
    </div>
  );
}

function Hint({ id, children }: { id: string; children?: ReactNode }) {
  if (!children) return null;
  return (
    <p id={id} className="mt-1 text-sm text-graphite-600">
      {children}
    </p>
  );
}

function describedBy(hintId: string | null, errorId: string | null) {
  return [hintId, errorId].filter(Boolean).join(" ") || undefined;
}

function Label({ htmlFor, children }: { htmlFor: string; children: ReactNode }) {
  return (
    <label htmlFor={htmlFor} className="mb-1 block text-sm font-medium text-ink-900">
      {children}
    </label>
  );
}

/** A labelled input with its hint and errors wired by id for screen readers. */
export function Field({ label, errors, hint, id, ...input }: Common & InputHTMLAttributes<HTMLInputElement> & { id: string }) {
  const errorId = `${id}-error`;
  const hintId = `${id}-hint`;
  return (
    <div>
      <Label htmlFor={id}>{label}</Label>
      <input
        id={id}
        {...input}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={describedBy(hint ? hintId : null, errors?.length ? errorId : null)}
        className={controlClass}
      />
      <Hint id={hintId}>{hint}</Hint>
      <ErrorLine id={errorId} errors={errors} />
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
  const hintId = `${id}-hint`;
  return (
    <div>
      <Label htmlFor={id}>{label}</Label>
      <select
        id={id}
        {...select}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={describedBy(hint ? hintId : null, errors?.length ? errorId : null)}
        className={controlClass}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      <Hint id={hintId}>{hint}</Hint>
      <ErrorLine id={errorId} errors={errors} />
    </div>
  );
}

/** A labelled multi-line input, like Field. */
export function TextAreaField({ label, errors, hint, id, ...input }: Common & TextareaHTMLAttributes<HTMLTextAreaElement> & { id: string }) {
  const errorId = `${id}-error`;
  const hintId = `${id}-hint`;
  return (
    <div>
      <Label htmlFor={id}>{label}</Label>
      <textarea
        id={id}
        rows={3}
        {...input}
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={describedBy(hint ? hintId : null, errors?.length ? errorId : null)}
        className={controlClass}
      />
      <Hint id={hintId}>{hint}</Hint>
      <ErrorLine id={errorId} errors={errors} />
    </div>
  );
}

/** Errors about the whole form (a refused sign-in, a server refusal), above its fields. */
export function FormErrors({ errors }: { errors?: string[] | null }) {
  if (!errors?.length) return null;
  return (
    <div role="alert" className="flex items-start gap-2 rounded-control border-l-4 border-danger-700 bg-danger-100 px-3 py-2.5 text-sm text-danger-700">
      <StateGlyph state="danger" className="mt-0.5 h-4 w-4" />
      <span>{errors.join(" ")}</span>
    </div>
  );
}
