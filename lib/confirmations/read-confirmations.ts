import "server-only";
import { listCircleRecipientsByClientId } from "@/db/queries/client-circle";
import { listConfirmationsByVersionId } from "@/db/queries/confirmations";

// Who in the client's circle has said the stimulator matches a version, and who has not yet.
export async function confirmationStatus(clientId: string, versionId: string) {
  const [confirmations, circle] = await Promise.all([listConfirmationsByVersionId(versionId), listCircleRecipientsByClientId(clientId)]);
  const confirmedIds = new Set(confirmations.map((c) => c.confirmation.confirmedById));
  const waiting = circle.filter((person) => !confirmedIds.has(person.id)).map((person) => person.name);
  return {
    confirmed: confirmations.map((c) => ({ name: c.name, at: c.confirmation.confirmedAt })),
    waiting,
    anyConfirmed: confirmations.length > 0,
  };
}
