import type { Metadata } from "next";
import Link from "next/link";
import { ScreeningDeferral } from "@/components/screening/deferral";
import { Notice } from "@/components/ui/notice";
import { getLatestScreeningByClientId } from "@/db/queries/screenings";
import { requirePageClientAccess } from "@/lib/auth/page-guards";
import type { ScreeningAnswers } from "@/lib/screening/schema";
import { screeningFormDefaults } from "./_components/form-defaults";
import { ScreeningForm } from "./_components/screening-form";

export const metadata: Metadata = { title: "New screening" };

export default async function NewScreeningPage({ params }: { params: Promise<{ clientId: string }> }) {
  const { clientId } = await params;
  const { actor, client } = await requirePageClientAccess(clientId, "therapist");
  const latest = await getLatestScreeningByClientId(client.id);
  // Only the signing command writes answers, always parsed by the shared schema.
  const defaults = screeningFormDefaults(latest ? (latest.screening.answers as ScreeningAnswers) : null, client);
  return (
    <div className="flex flex-col gap-6">
      <p>
        <Link href={`/clients/${encodeURIComponent(client.id)}/screening`}>Back to the screening history</Link>
      </p>
      <div>
        <h1 className="text-3xl">{latest ? "Re-screen" : "Screening"}: {client.fullName}</h1>
        <p className="mt-1 text-ink-soft">Contraindication screening for home electrical stimulation.</p>
      </div>
      {latest ? (
        <Notice tone="note" title={`Started from version ${latest.screening.version}`}>
          Sections A to D start from the answers signed on version {latest.screening.version}: check each one with the client. The test
          stimulation and the outcome are for today.
        </Notice>
      ) : null}
      <ScreeningDeferral />
      <ScreeningForm clientId={client.id} signerName={actor.name} nextVersion={(latest?.screening.version ?? 0) + 1} defaults={defaults} />
    </div>
  );
}
