import { Button, Link, Text } from "@react-email/components";
import type { Role } from "@/lib/auth/roles";
import { buttonStyle, EmailLayout, paragraphStyle } from "./email-layout";

type InvitationEmailProps = { inviteeName: string; clinicName: string; inviterName: string; role: Role; url: string };

// Staff see their role; clients and carers are not told anything about care in the e-mail itself.
const purpose: Record<Role, string> = {
  admin: "to help run the clinic's Rampline account",
  therapist: "to join the clinic's team on Rampline",
  client: "to set up your Rampline account",
  carer: "to set up your Rampline account",
};

export function invitationSubject({ clinicName }: Pick<InvitationEmailProps, "clinicName">): string {
  return `You're invited to Rampline by ${clinicName}`;
}

export function InvitationEmail({ inviteeName, clinicName, inviterName, role, url }: InvitationEmailProps) {
  return (
    <EmailLayout preview={`${inviterName} has invited you to Rampline`}>
      <Text style={paragraphStyle}>Hello {inviteeName},</Text>
      <Text style={paragraphStyle}>
        {inviterName} at {clinicName} has invited you {purpose[role]}. Choose a password to accept. The link works
        for 7 days.
      </Text>
      <Button href={url} style={buttonStyle}>
        Accept the invitation
      </Button>
      <Text style={{ ...paragraphStyle, fontSize: 14, marginTop: 24 }}>
        If the button does not work, copy this address into your browser: <Link href={url}>{url}</Link>
      </Text>
    </EmailLayout>
  );
}
