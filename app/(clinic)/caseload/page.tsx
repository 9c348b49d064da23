import type { Metadata } from "next";
import { Card, EmptyState } from "@/components/ui/card";
import { listCaseloadRowsByTherapistId } from "@/db/queries/clients";
import { requirePageActor } from "@/lib/auth/page-guards";
import { CaseloadTable } from "./_components/caseload-table";
import { InviteClientForm } from "./_components/invite-client-form";

export const metadata: Metadata = { title: "Caseload" };

export default async function CaseloadPage() {
  const actor = await requirePageActor("therapist");
  const clients = await listCaseloadRowsByTherapistId(actor.organizationId, actor.userId);
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1 className="text-3xl">Caseload</h1>
        <p className="mt-1 text-ink-soft">Clients for whom you are the primary therapist.</p>
      </div>
      <Card title="Your clients">
        {clients.length === 0 ? (
          <EmptyState title="No clients yet">
            Invite your first client below. They get an e-mail with a link to set a password; you can screen them and
            write their programme straight away.
          </EmptyState>
        ) : (
          <CaseloadTable rows={clients} />
        )}
      </Card>
      <Card title="Invite a client">
        <InviteClientForm />
      </Card>
    </div>
  );
}
