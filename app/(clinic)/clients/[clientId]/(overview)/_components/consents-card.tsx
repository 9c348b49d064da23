import { Card } from "@/components/ui/card";
import { currentConsents, listConsentEventsByClientId } from "@/db/queries/consents";
import { CONSENT_LABELS } from "@/lib/clients/schemas";
import { ConsentForm } from "./consent-form";

const when = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "Europe/London" });
const HOW = { verbal: "in person or by phone", written: "in writing", "in-app": "in Rampline" } as const;

export async function ConsentsCard({ clientId, canRecord }: { clientId: string; canRecord: boolean }) {
  const events = await listConsentEventsByClientId(clientId);
  const current = currentConsents(events);
  return (
    <Card title="Consents">
      <ul className="flex flex-col gap-2">
        {current.map(({ kind, event }) => (
          <li key={kind} className="flex flex-wrap justify-between gap-2 border-b border-line-soft pb-2">
            <span className="font-bold">{CONSENT_LABELS[kind]}</span>
            <span>
              {event ? (
                <>
                  <span aria-hidden>{event.status === "given" ? "✓ " : "✕ "}</span>
                  {event.status === "given" ? "Given" : "Withdrawn"} {HOW[event.method]}, {when.format(event.recordedAt)}
                </>
              ) : (
                <span className="text-ink-soft">Not recorded</span>
              )}
            </span>
          </li>
        ))}
      </ul>
      {events.length > 0 ? (
        <details className="mt-3">
          <summary className="cursor-pointer font-bold">History ({events.length})</summary>
          <ol className="mt-2 flex flex-col gap-1 text-sm">
            {events.map(({ consent, recordedByName }) => (
              <li key={consent.id}>
                {when.format(consent.recordedAt)}: {CONSENT_LABELS[consent.kind]}, {consent.status} {HOW[consent.method]}, recorded by{" "}
                {recordedByName}
                {consent.note ? ` (${consent.note})` : ""}
              </li>
            ))}
          </ol>
        </details>
      ) : null}
      {canRecord ? (
        <div className="mt-6">
          <h3 className="mb-3 text-lg">Record a consent or a withdrawal</h3>
          <ConsentForm clientId={clientId} />
        </div>
      ) : null}
    </Card>
  );
}
