// A client ready for a programme (consent to treatment and a clean screening) and programme values that pass every
// publishing check. Invented test data; the stimulation settings are Rampline's built-in starting point.
import { markerInZone } from "@/lib/placement";
import { recordConsent } from "@/lib/consents/record-consent";
import { programmeFromTemplate } from "@/lib/programmes/templates";
import { BUILT_IN_TEMPLATES } from "@/lib/programmes/templates";
import type { ProgrammeFormValues } from "@/lib/programmes/form-values";
import { signScreening } from "@/lib/screening/sign";
import type { Actor } from "@/lib/auth/actor";
import { cleanAnswers } from "../unit/screening/answers-fixture";

export function publishableValues(): ProgrammeFormValues {
  const values = programmeFromTemplate(BUILT_IN_TEMPLATES.find((t) => t.id === "wrist-finger-extension")!.channels);
  const channel = values.channels[0]!;
  channel.side = "left";
  channel.markers = [markerInZone("left-forearm-dorsal"), markerInZone("left-wrist-dorsal")];
  return values;
}

export async function prepareClient(therapist: Actor, clientId: string, answers = cleanAnswers()) {
  await recordConsent(therapist, clientId, { kind: "treatment", status: "given", method: "written" });
  return signScreening(therapist, clientId, answers);
}
