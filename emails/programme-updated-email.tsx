import { Button, Text } from "@react-email/components";
import { buttonStyle, EmailLayout, paragraphStyle } from "./email-layout";

// Says only that there is something new to read: no settings, no body parts, no clinical words.
export function programmeUpdatedSubject(): string {
  return "There is an update for you in Rampline";
}

export function ProgrammeUpdatedEmail({ name, clinicName, url }: { name: string; clinicName: string; url: string }) {
  return (
    <EmailLayout preview={`${clinicName} has shared an update with you`}>
      <Text style={paragraphStyle}>Hello {name},</Text>
      <Text style={paragraphStyle}>
        {clinicName} has shared an update with you in Rampline. Sign in to read it before your next session.
      </Text>
      <Button href={url} style={buttonStyle}>
        Sign in to Rampline
      </Button>
    </EmailLayout>
  );
}
