"use client";
import { useFormContext, useWatch } from "react-hook-form";
import { ConcernList } from "@/components/screening/concern-list";
import { Notice } from "@/components/ui/notice";
import { redFlagLabel } from "@/lib/screening/questions";
import { allConcerns, redFlagsPresent, type AnswersDraft } from "@/lib/screening/rules";
import type { ScreeningFormValues } from "@/lib/screening/schema";

// What the answers so far add up to, shown above the signing button so the therapist reviews it before signing.
// It follows the form as it is filled in; the signed record is worked out again on the server.
export function SigningSummary() {
  const { control } = useFormContext<ScreeningFormValues>();
  const values = useWatch({ control }) as AnswersDraft;
  const flags = redFlagsPresent(values);
  const concerns = allConcerns(values);
  return (
    <div className="flex flex-col gap-4" aria-live="polite">
      <h3 className="text-lg">Red flags</h3>
      {flags.length === 0 ? (
        <p className="text-ink-soft">No systemic red flags answered “yes”.</p>
      ) : (
        <Notice tone="blocks" title="Needs a named clinician's clearance">
          <ul className="list-disc pl-5">
            {flags.map((flag) => (
              <li key={flag}>{redFlagLabel(flag)}</li>
            ))}
          </ul>
          <p className="mt-2">After signing, record each clearance on the screening page; until then no programme can be published.</p>
        </Notice>
      )}
      <h3 className="text-lg">Concerns</h3>
      <ConcernList concerns={concerns} empty="No concerns in the answers so far." />
    </div>
  );
}
