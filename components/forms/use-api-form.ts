"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useState } from "react";
import { useForm, type DefaultValues, type FieldValues, type Path } from "react-hook-form";
import type { z } from "zod";
import { ApiError } from "@/lib/api-client";

type Options<S extends z.ZodType<FieldValues, FieldValues>, R> = {
  schema: S;
  defaultValues: DefaultValues<z.input<S>>;
  submit: (values: z.output<S>) => Promise<R>;
  onSuccess?: (result: R, values: z.output<S>) => void;
};

// react-hook-form with the shared zod schema, sending through a TanStack mutation. Field messages from the server
// land on their fields; anything else becomes one message at the top of the form.
export function useApiForm<S extends z.ZodType<FieldValues, FieldValues>, R>({ schema, defaultValues, submit, onSuccess }: Options<S, R>) {
  const form = useForm<z.input<S>, unknown, z.output<S>>({ resolver: zodResolver(schema), defaultValues, mode: "onTouched" });
  const [formError, setFormError] = useState<string | null>(null);
  const mutation = useMutation({ mutationFn: submit, onSuccess });

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      await mutation.mutateAsync(values);
    } catch (error) {
      if (error instanceof ApiError && error.fields) {
        let placed = false;
        for (const [name, message] of Object.entries(error.fields)) {
          if (name in (form.getValues() as object)) {
            form.setError(name as Path<z.input<S>>, { type: "server", message }, { shouldFocus: !placed });
            placed = true;
          }
        }
        if (!placed) setFormError(error.message);
        else if (error.code !== "VALIDATION") setFormError(error.message);
      } else {
        setFormError(error instanceof Error ? error.message : "Something went wrong. Please try again.");
      }
    }
  });

  return { form, onSubmit, formError, busy: mutation.isPending, succeeded: mutation.isSuccess, result: mutation.data };
}
