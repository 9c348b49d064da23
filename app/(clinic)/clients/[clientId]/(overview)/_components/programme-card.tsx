import Link from "next/link";
import { buttonClasses } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { getLatestVersionByProgrammeId, getProgrammeByClientId } from "@/db/queries/programmes";
import { confirmationStatus } from "@/lib/confirmations/read-confirmations";

const when = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeZone: "Europe/London" });

export async function ProgrammeCard({ clientId, clientName }: { clientId: string; clientName: string }) {
  const programme = await getProgrammeByClientId(clientId);
  const latest = programme ? await getLatestVersionByProgrammeId(programme.id) : null;
  const confirmations = latest ? await confirmationStatus(clientId, latest.id) : null;
  return (
    <Card title="Programme">
      <p className="mb-4">
        {latest
          ? `Version ${latest.number} in force since ${when.format(latest.publishedAt)}.`
          : programme?.draft
            ? "A draft is in progress; nothing is published yet."
            : `No programme yet. Until one is published, ${clientName} sees an empty Today page.`}
      </p>
      {confirmations ? (
        <p className="mb-4" aria-label="Stimulator confirmations">
          <span aria-hidden>{confirmations.anyConfirmed ? "✓ " : "▲ "}</span>
          {confirmations.confirmed.length > 0 ? `Stimulator set to version ${latest!.number}: confirmed by ${confirmations.confirmed.map((c) => c.name).join(", ")}.` : `Nobody has confirmed the stimulator matches version ${latest!.number} yet.`}
          {confirmations.waiting.length > 0 ? ` Not yet confirmed by: ${confirmations.waiting.join(", ")}.` : ""}
        </p>
      ) : null}
      <div className="flex flex-wrap gap-3">
        <Link href={`/clients/${clientId}/programme`} className={buttonClasses("primary")}>
          {latest || programme?.draft ? "Open the programme builder" : "Write a programme"}
        </Link>
        {latest ? (
          <>
            <Link href={`/clients/${clientId}/programme/versions`} className={buttonClasses("secondary")}>
              Versions and changes
            </Link>
            <Link href={`/clients/${clientId}/handout`} className={buttonClasses("secondary")}>
              Handout
            </Link>
          </>
        ) : null}
      </div>
    </Card>
  );
}
