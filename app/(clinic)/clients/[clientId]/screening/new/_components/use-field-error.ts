"use client";
import { get, useFormContext, type FieldPath } from "react-hook-form";
import type { ScreeningFormValues } from "@/lib/screening/schema";

export type ScreeningPath = FieldPath<ScreeningFormValues>;

// The message on one field of the screening form (nested paths such as "sites.0.skinIntact" included).
export function useFieldError(name: string): string | undefined {
  const { formState } = useFormContext<ScreeningFormValues>();
  const error = get(formState.errors, name) as { message?: unknown } | undefined;
  return typeof error?.message === "string" ? error.message : undefined;
}
