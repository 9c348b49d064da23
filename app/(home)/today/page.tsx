import type { Metadata } from "next";
import { CarerList } from "@/components/carer-list";
import { InviteCarerForm } from "@/components/forms/invite-carer-form";
import { Card, EmptyState } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { listCarersByClientId } from "@/db/queries/carers";
import { getClientById } from "@/db/queries/clients";
import { requirePageActor } from "@/lib/auth/page-guards";

export const metadata: Metadata = { title: "Today" };

const today = new Intl.DateTimeFormat("en-GB", { weekday: "long", day: "numeric", month: "long" });

export default async function TodayPage() {
  const actor = await requirePageActor("client", "carer");
  const client = actor.clientId ? await getClientById(actor.clientId) : null;
  if (!client) {
    return (
      <Notice tone="warning" word="Not linked yet">
        Your account is not linked to a client record. Contact your clinic, {actor.clinicName}.
      </Notice>
    );
  }
  const carers = actor.role === "client" ? await listCarersByClientId(client.id) : [];
  const firstName = actor.name.split(" ")[0];
  return (
    <div className="flex flex-col gap-6">
      <div>
        <p className="text-ink-soft">{today.format(new Date())}</p>
        <h1 className="text-3xl">Hello, {firstName}</h1>
        {actor.role === "carer" ? <p className="mt-1">You are helping {client.fullName}.</p> : null}
      </div>
      <Card title="Today's sessions">
        <EmptyState title="No programme yet">
          {actor.role === "carer" ? `${client.fullName}'s` : "Your"} therapist has not published a programme yet.
          When they do, today&apos;s sessions appear here and you get an e-mail to say so.
        </EmptyState>
      </Card>
      {actor.role === "client" ? (
        <Card title="People who help you">
          <CarerList carers={carers} clientName="you" />
          <div className="mt-6">
            <h3 className="mb-3 text-lg">Invite a carer</h3>
            <p className="mb-4 text-ink-soft">
              A carer can do everything you can in Rampline, on your behalf. Everything they do is recorded as done by
              them.
            </p>
            <InviteCarerForm clientId={client.id} clientName={client.fullName} asTherapist={false} />
          </div>
        </Card>
      ) : null}
    </div>
  );
}
