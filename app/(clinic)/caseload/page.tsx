import type { Metadata } from "next";
import Link from "next/link";
import { Card, EmptyState } from "@/components/ui/card";
import { listCaseloadByTherapistId } from "@/db/queries/clients";
import { requirePageActor } from "@/lib/auth/page-guards";
import { InviteClientForm } from "./_components/invite-client-form";

export const metadata: Metadata = { title: "Caseload" };

export default async function CaseloadPage() {
  const actor = await requirePageActor("therapist");
  const clients = await listCaseloadByTherapistId(actor.organizationId, actor.userId);
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
          <table className="w-full text-left">
            <caption className="sr-only">Your clients</caption>
            <thead>
              <tr className="border-b border-line">
                <th scope="col" className="py-2">Client</th>
                <th scope="col" className="py-2">Account</th>
              </tr>
            </thead>
            <tbody>
              {clients.map((record) => (
                <tr key={record.id} className="border-b border-line-soft">
                  <td className="py-2">
                    <Link href={`/clients/${record.id}`} className="font-bold">
                      {record.fullName}
                    </Link>
                    <span className="block text-sm text-ink-soft">{record.email}</span>
                  </td>
                  <td className="py-2">{record.userId ? "Active" : "Invitation sent"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </Card>
      <Card title="Invite a client">
        <InviteClientForm />
      </Card>
    </div>
  );
}
