import { forwardRef, useId, type InputHTMLAttributes, type SelectHTMLAttributes } from "react";
import { FieldError } from "@/components/ui/text-field";

type Option = { value: string; label: string };
type SelectFieldProps = SelectHTMLAttributes<HTMLSelectElement> & { label: string; options: readonly Option[]; error?: string };

// A labelled select with its error announced with it, matching TextField (large target, visible focus).
export const SelectField = forwardRef<HTMLSelectElement, SelectFieldProps>(function SelectField({ label, options, error, className = "", ...props }, ref) {
  const id = useId();
  const errorId = error ? `${id}-error` : undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="font-bold">
        {label}
      </label>
      <select
        ref={ref}
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={errorId}
        className={`min-h-12 rounded-md border-2 bg-white px-3 text-base text-ink ${error ? "border-blocks" : "border-line"}`}
        {...props}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      {error ? <FieldError id={errorId!} message={error} /> : null}
    </div>
  );
});

type ChoiceProps = InputHTMLAttributes<HTMLInputElement> & { label: string; hint?: string };

/** A radio button or checkbox with a whole-row click target of at least 44 px. */
export const Choice = forwardRef<HTMLInputElement, ChoiceProps>(function Choice({ label, hint, type = "radio", ...props }, ref) {
  const id = useId();
  return (
    <label htmlFor={id} className="flex min-h-11 cursor-pointer items-start gap-3 rounded-md px-1 py-2 hover:bg-line-soft">
      <input ref={ref} id={id} type={type} className="mt-0.5 size-5 shrink-0 accent-ink" {...props} />
      <span>
        <span className="block">{label}</span>
        {hint ? <span className="block text-sm text-ink-soft">{hint}</span> : null}
      </span>
    </label>
  );
});
