import type { Metadata } from "next";
import { buttonClasses } from "@/components/ui/button";
import { Card, EmptyState } from "@/components/ui/card";
import { listAuditEventsByOrganizationId } from "@/db/queries/audit";
import { listClientsByOrganizationId } from "@/db/queries/clients";
import { auditActionLabel, auditChanges } from "@/lib/audit/labels";
import { requirePageActor } from "@/lib/auth/page-guards";

export const metadata: Metadata = { title: "Audit trail" };

const when = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "medium", timeZone: "Europe/London" });

export default async function AuditPage({ searchParams }: { searchParams: Promise<{ client?: string }> }) {
  const actor = await requirePageActor("admin");
  const { client: clientId } = await searchParams;
  const clients = await listClientsByOrganizationId(actor.organizationId);
  const selected = clients.find((c) => c.id === clientId)?.id;
  const events = await listAuditEventsByOrganizationId(actor.organizationId, { clientId: selected });
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1 className="text-3xl">Audit trail</h1>
        <p className="mt-1 text-ink-soft">Who did what, when, with the values before and after. The newest 200 entries.</p>
      </div>
      <form method="get" className="flex flex-wrap items-end gap-3">
        <div className="flex flex-col gap-1">
          <label htmlFor="audit-client" className="font-bold">
            Client
          </label>
          <select id="audit-client" name="client" defaultValue={selected ?? ""} className="min-h-12 rounded-md border-2 border-line bg-white px-3">
            <option value="">All of the clinic</option>
            {clients.map((c) => (
              <option key={c.id} value={c.id}>
                {c.fullName}
              </option>
            ))}
          </select>
        </div>
        <button type="submit" className={buttonClasses("secondary")}>
          Show
        </button>
      </form>
      <Card>
        {events.length === 0 ? (
          <EmptyState title="Nothing recorded yet">Invitations, consents, screenings and programme changes appear here as they happen.</EmptyState>
        ) : (
          <table className="w-full text-left">
            <caption className="sr-only">Audit entries, newest first</caption>
            <thead>
              <tr className="border-b border-line">
                <th scope="col" className="py-2 pr-3">When</th>
                <th scope="col" className="py-2 pr-3">Who</th>
                <th scope="col" className="py-2 pr-3">What</th>
                <th scope="col" className="py-2 pr-3">Client</th>
                <th scope="col" className="py-2">Before → after</th>
              </tr>
            </thead>
            <tbody>
              {events.map(({ event, actorName, clientName }) => (
                <tr key={event.id} className="border-b border-line-soft align-top">
                  <td className="py-2 pr-3 whitespace-nowrap tabular-nums">{when.format(event.createdAt)}</td>
                  <td className="py-2 pr-3">{actorName ?? "Rampline"}</td>
                  <td className="py-2 pr-3">{auditActionLabel(event.action)}</td>
                  <td className="py-2 pr-3">{clientName ?? "—"}</td>
                  <td className="py-2 text-sm">
                    <ul>
                      {auditChanges(event.before, event.after).map((line) => (
                        <li key={line} className="break-words">{line}</li>
                      ))}
                    </ul>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </Card>
    </div>
  );
}
