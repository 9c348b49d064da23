import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Notice } from "@/components/ui/notice";
import { getInvitationById } from "@/db/queries/invitations";
import { ROLE_LABELS, isRole } from "@/lib/auth/roles";
import { invitationProblem } from "@/lib/invitations/accept";
import { AcceptInvitationForm } from "./_components/accept-invitation-form";

export const metadata: Metadata = { title: "Accept your invitation" };

export default async function InvitationPage({ params }: { params: Promise<{ invitationId: string }> }) {
  const { invitationId } = await params;
  const found = await getInvitationById(invitationId);
  const role = found?.invitation.role;
  if (!found || !isRole(role)) notFound();
  const { invitation, clinicName, inviterName } = found;
  const problem = invitationProblem(invitation.status, invitation.expiresAt);
  return (
    <>
      <h1 className="text-2xl">Join {clinicName} on Rampline</h1>
      <p className="mt-2 text-ink-soft">
        {inviterName} invited <strong className="text-ink">{invitation.email}</strong> as{" "}
        {ROLE_LABELS[role].toLowerCase()}.
      </p>
      <div className="mt-6">
        {problem ? (
          <Notice tone="warning" word="Cannot be used">
            {problem.message} <Link href="/sign-in">Go to sign in</Link>.
          </Notice>
        ) : (
          <AcceptInvitationForm invitationId={invitation.id} suggestedName={invitation.inviteeName ?? ""} />
        )}
      </div>
    </>
  );
}
