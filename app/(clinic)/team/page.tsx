import type { Metadata } from "next";
import { Card, EmptyState } from "@/components/ui/card";
import { listPendingInvitationsByOrganizationId } from "@/db/queries/invitations";
import { listStaffByOrganizationId } from "@/db/queries/members";
import { requirePageActor } from "@/lib/auth/page-guards";
import { ROLE_LABELS, isRole } from "@/lib/auth/roles";
import { InviteTherapistForm } from "./_components/invite-therapist-form";
import { TherapistActiveToggle } from "./_components/therapist-active-toggle";

export const metadata: Metadata = { title: "Team" };

const dateFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric" });

export default async function TeamPage() {
  const actor = await requirePageActor("admin");
  const [staff, pending] = await Promise.all([
    listStaffByOrganizationId(actor.organizationId),
    listPendingInvitationsByOrganizationId(actor.organizationId, ["therapist"]),
  ]);
  const therapists = staff.filter((person) => person.role === "therapist");
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1 className="text-3xl">Team</h1>
        <p className="mt-1 text-ink-soft">The people who run {actor.clinicName} on Rampline.</p>
      </div>
      <Card title="Invite a therapist">
        <InviteTherapistForm />
      </Card>
      <Card title="Staff">
        {therapists.length === 0 ? (
          <EmptyState title="No therapists yet">
            Invite your first therapist above. They will get an e-mail with a link to choose a password.
          </EmptyState>
        ) : null}
        <table className="mt-2 w-full text-left">
          <caption className="sr-only">Clinic staff</caption>
          <thead>
            <tr className="border-b border-line">
              <th scope="col" className="py-2">Name</th>
              <th scope="col" className="py-2">Role</th>
              <th scope="col" className="py-2">Status</th>
              <th scope="col" className="py-2"><span className="sr-only">Actions</span></th>
            </tr>
          </thead>
          <tbody>
            {staff.map((person) => (
              <tr key={person.memberId} className="border-b border-line-soft">
                <td className="py-2">
                  <span className="block font-bold">{person.name}</span>
                  <span className="text-sm text-ink-soft">{person.email}</span>
                </td>
                <td className="py-2">{isRole(person.role) ? ROLE_LABELS[person.role] : person.role}</td>
                <td className="py-2">{person.banned ? "Deactivated" : "Active"}</td>
                <td className="py-2 text-right">
                  {person.role === "therapist" ? (
                    <TherapistActiveToggle memberId={person.memberId} name={person.name} active={!person.banned} />
                  ) : null}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </Card>
      <Card title="Invitations waiting">
        {pending.length === 0 ? (
          <p className="text-ink-soft">No invitations are waiting to be accepted.</p>
        ) : (
          <ul className="flex flex-col gap-2">
            {pending.map((invitation) => (
              <li key={invitation.id} className="flex flex-wrap justify-between gap-2 border-b border-line-soft py-2">
                <span>
                  <span className="font-bold">{invitation.inviteeName}</span> · {invitation.email}
                </span>
                <span className="text-sm text-ink-soft">Link valid until {dateFormat.format(invitation.expiresAt)}</span>
              </li>
            ))}
          </ul>
        )}
      </Card>
    </div>
  );
}
