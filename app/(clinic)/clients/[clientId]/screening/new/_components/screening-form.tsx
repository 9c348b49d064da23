"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { FormProvider, useForm, type FieldErrors, type Path } from "react-hook-form";
import { FormAlert } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { ApiError, sendJson } from "@/lib/api-client";
import { signScreeningSchema, type ScreeningAnswers, type ScreeningFormValues } from "@/lib/screening/schema";
import { CapacitySection } from "./capacity-section";
import { ContextSection } from "./context-section";
import type { ScreeningDefaults } from "./form-defaults";
import { FormSection } from "./form-section";
import { OutcomeSection } from "./outcome-section";
import { RedFlagsSection } from "./red-flags-section";
import { SigningSummary } from "./signing-summary";
import { SitesSection } from "./sites-section";
import { TestSection } from "./test-section";

type Props = { clientId: string; signerName: string; nextVersion: number; defaults: ScreeningDefaults };
type Signed = { version: number };

function countMessages(errors: FieldErrors): number {
  let count = 0;
  const walk = (node: unknown) => {
    if (!node || typeof node !== "object") return;
    if (typeof (node as { message?: unknown }).message === "string") count += 1;
    for (const [key, child] of Object.entries(node)) if (key !== "ref" && key !== "message") walk(child);
  };
  walk(errors);
  return count;
}

// The checklist (sections A–F), checked with the same schema the server uses, then signed in the therapist's name.
export function ScreeningForm({ clientId, signerName, nextVersion, defaults }: Props) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<ScreeningFormValues, unknown, ScreeningAnswers>({ resolver: zodResolver(signScreeningSchema), defaultValues: defaults, mode: "onTouched" });
  const url = `/api/clients/${encodeURIComponent(clientId)}/screenings`;
  const mutation = useMutation({ mutationFn: (values: ScreeningAnswers) => sendJson<Signed>("POST", url, values) });

  const onSubmit = form.handleSubmit(
    async (values) => {
      setFormError(null);
      try {
        const signed = await mutation.mutateAsync(values);
        router.push(`/clients/${encodeURIComponent(clientId)}/screening?signed=${signed.version}`);
      } catch (error) {
        if (!(error instanceof ApiError)) return setFormError("Something went wrong. Please try again.");
        // Server messages land on their fields, nested paths included ("sites.0.skinIntact").
        Object.entries(error.fields ?? {}).forEach(([name, message], index) =>
          form.setError(name as Path<ScreeningFormValues>, { type: "server", message }, { shouldFocus: index === 0 }),
        );
        setFormError(error.fields ? "Nothing was signed: some answers need attention. Each one has a message beside it." : error.message);
      }
    },
    (errors) => {
      const count = countMessages(errors);
      setFormError(`Nothing was signed: ${count === 1 ? "one answer needs" : `${count} answers need`} attention. The first one is selected; each has a message beside it.`);
    },
  );

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6" aria-label="Screening checklist">
        <ContextSection />
        <RedFlagsSection />
        <SitesSection />
        <CapacitySection />
        <TestSection />
        <OutcomeSection />
        <FormSection title="Check and sign">
          <SigningSummary />
          <p>
            Signing records this screening as version {nextVersion} in your name, <strong>{signerName}</strong>, with today&apos;s date and
            time. A signed version cannot be changed: a re-screen makes a new version.
          </p>
          <FormAlert message={formError} />
          <div>
            <Button type="submit" large busy={mutation.isPending}>
              Sign screening as {signerName}
            </Button>
          </div>
        </FormSection>
      </form>
    </FormProvider>
  );
}
