import type { InputHTMLAttributes } from "react";

/** A labelled input with its error message tied to it for screen readers. */
export function Field({ label, error, id, hint, ...rest }: InputHTMLAttributes<HTMLInputElement> & { label: string; id: string; error?: string; hint?: string }) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium text-walnut-900">{label}</label>
      <input
        id={id}
        aria-invalid={!!error}
        aria-describedby={error ? `${id}-error` : hint ? `${id}-hint` : undefined}
        className="rounded-md border border-walnut-300 bg-white px-3 py-2 text-walnut-900 aria-[invalid=true]:border-brick-500"
        {...rest}
      />
      {hint && !error && <p id={`${id}-hint`} className="text-xs text-walnut-500">{hint}</p>}
      {error && <p id={`${id}-error`} className="text-sm text-brick-700">{error}</p>}
    </div>
  );
}
