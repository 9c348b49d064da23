import type { DefaultValues } from "react-hook-form";
import type { Client } from "@/db/schema";
import type { ScreeningAnswers, ScreeningFormValues } from "@/lib/screening/schema";

// Starting values for the screening form. A first screening starts from the client record's clinical summary; a
// re-screen starts from the latest signed version's context, red flags, sites and capacity, while the test
// stimulation and the outcome start empty because they belong to this visit and this decision.
export type ScreeningDefaults = DefaultValues<ScreeningFormValues>;

export function emptySite(): ScreeningDefaults["sites"] extends (infer S)[] | undefined ? S : never {
  return { name: "", notes: "" };
}

export function screeningFormDefaults(
  latest: ScreeningAnswers | null,
  record: Pick<Client, "condition" | "affectedSide" | "onsetDate">,
): ScreeningDefaults {
  const fresh = { testStimulation: { notDoneReason: "" }, outcome: { rescreenOn: "", notes: "" } };
  if (latest) {
    return {
      context: { ...latest.context, onset: { date: latest.context.onset.date ?? "", timeSince: latest.context.onset.timeSince ?? "" } },
      redFlags: latest.redFlags,
      sites: latest.sites.length > 0 ? latest.sites.map((site) => ({ ...site, notes: site.notes ?? "" })) : [emptySite()],
      capacity: latest.capacity,
      ...fresh,
    };
  }
  return {
    context: {
      diagnosis: record.condition ?? "",
      affectedSide: record.affectedSide ?? undefined,
      onset: { date: record.onsetDate ?? "", timeSince: "" },
    },
    sites: [emptySite()],
    ...fresh,
  };
}
