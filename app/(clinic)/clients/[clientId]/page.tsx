import type { Metadata } from "next";
import { CarerList } from "@/components/carer-list";
import { InviteCarerForm } from "@/components/forms/invite-carer-form";
import { Card, EmptyState } from "@/components/ui/card";
import { listCarersByClientId } from "@/db/queries/carers";
import { requirePageClientAccess } from "@/lib/auth/page-guards";

export const metadata: Metadata = { title: "Client" };

export default async function ClientPage({ params }: { params: Promise<{ clientId: string }> }) {
  const { clientId } = await params;
  const { actor, client } = await requirePageClientAccess(clientId, "therapist", "admin");
  const carers = await listCarersByClientId(client.id);
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1 className="text-3xl">{client.fullName}</h1>
        <p className="mt-1 text-ink-soft">
          {client.email} · {client.userId ? "account active" : "invitation sent, not yet accepted"}
        </p>
      </div>
      <Card title="Programme">
        <EmptyState title="No programme yet">
          Screening and the programme builder come next. Until a programme is published, {client.fullName} sees an
          empty Today page.
        </EmptyState>
      </Card>
      <Card title="Carers">
        <CarerList carers={carers} clientName={client.fullName} />
        {actor.role === "therapist" ? (
          <div className="mt-6">
            <h3 className="mb-3 text-lg">Invite a carer on {client.fullName}&apos;s behalf</h3>
            <InviteCarerForm clientId={client.id} clientName={client.fullName} asTherapist />
          </div>
        ) : null}
      </Card>
    </div>
  );
}
