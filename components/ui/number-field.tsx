import { forwardRef, type InputHTMLAttributes } from "react";
import { TextField } from "@/components/ui/text-field";

type NumberFieldProps = InputHTMLAttributes<HTMLInputElement> & { label: string; hint?: string; error?: string };

// Typed as text that must be a number: step="any" stops the browser rounding or refusing decimals on its own, so
// the analysis's message is the only one shown.
export const NumberField = forwardRef<HTMLInputElement, NumberFieldProps>(function NumberField(props, ref) {
  return <TextField ref={ref} type="number" inputMode="decimal" step="any" autoComplete="off" {...props} />;
});
