import { forwardRef, useId, type InputHTMLAttributes } from "react";

type TextFieldProps = InputHTMLAttributes<HTMLInputElement> & { label: string; hint?: string; error?: string };

// A labelled input whose hint and error are announced with it (aria-describedby) and whose error is in words.
export const TextField = forwardRef<HTMLInputElement, TextFieldProps>(function TextField(
  { label, hint, error, id, className = "", ...props },
  ref,
) {
  const autoId = useId();
  const inputId = id ?? autoId;
  const hintId = hint ? `${inputId}-hint` : undefined;
  const errorId = error ? `${inputId}-error` : undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={inputId} className="font-bold">
        {label}
      </label>
      {hint ? (
        <p id={hintId} className="text-sm text-ink-soft">
          {hint}
        </p>
      ) : null}
      <input
        ref={ref}
        id={inputId}
        aria-invalid={error ? true : undefined}
        aria-describedby={[hintId, errorId].filter(Boolean).join(" ") || undefined}
        className={`min-h-12 rounded-md border-2 bg-white px-3 text-base text-ink ${error ? "border-blocks" : "border-line"}`}
        {...props}
      />
      {error ? <FieldError id={errorId!} message={error} /> : null}
    </div>
  );
});

export function FieldError({ id, message }: { id: string; message: string }) {
  return (
    <p id={id} className="flex items-start gap-1 text-sm font-bold text-blocks">
      <span aria-hidden>✕</span>
      <span>
        <span className="sr-only">Error: </span>
        {message}
      </span>
    </p>
  );
}
