import type { Metadata } from "next";
import { CarerList } from "@/components/carer-list";
import { InviteCarerForm } from "@/components/forms/invite-carer-form";
import { ScreeningSummary } from "@/components/screening/screening-summary";
import { Card } from "@/components/ui/card";
import { listCarersByClientId } from "@/db/queries/carers";
import { requirePageClientAccess } from "@/lib/auth/page-guards";
import { CheckInsCard } from "./_components/check-ins-card";
import { ClientDetailsForm } from "./_components/client-details-form";
import { ConsentsCard } from "./_components/consents-card";
import { ProgrammeCard } from "./_components/programme-card";

export const metadata: Metadata = { title: "Client" };

export default async function ClientPage({ params }: { params: Promise<{ clientId: string }> }) {
  const { clientId } = await params;
  const { actor, client } = await requirePageClientAccess(clientId, "therapist", "admin");
  const carers = await listCarersByClientId(client.id);
  const isTherapist = actor.role === "therapist";
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1 className="text-3xl">{client.fullName}</h1>
        <p className="mt-1 text-ink-soft">
          {client.email} · {client.userId ? "account active" : "invitation sent, not yet accepted"}
        </p>
      </div>
      <ProgrammeCard clientId={client.id} clientName={client.fullName} />
      <CheckInsCard clientId={client.id} />
      <div className="grid gap-6 lg:grid-cols-2">
        <ScreeningSummary clientId={client.id} />
        <ConsentsCard clientId={client.id} canRecord={isTherapist} />
      </div>
      <Card title="Clinical summary">
        <ClientDetailsForm
          clientId={client.id}
          canEdit={isTherapist}
          details={{ condition: client.condition, affectedSide: client.affectedSide, goals: client.goals, onsetDate: client.onsetDate }}
        />
      </Card>
      <Card title="Carers">
        <CarerList carers={carers} clientName={client.fullName} />
        {isTherapist ? (
          <div className="mt-6">
            <h3 className="mb-3 text-lg">Invite a carer on {client.fullName}&apos;s behalf</h3>
            <InviteCarerForm clientId={client.id} clientName={client.fullName} asTherapist />
          </div>
        ) : null}
      </Card>
    </div>
  );
}
