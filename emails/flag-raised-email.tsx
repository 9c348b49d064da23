import { Button, Text } from "@react-email/components";
import { buttonStyle, EmailLayout, paragraphStyle } from "./email-layout";

// Tells a therapist a report is waiting, without saying whose or what: the details are behind the sign-in.
export function flagRaisedSubject(urgent: boolean): string {
  return urgent ? "Urgent: a client's report needs you today" : "A client's report is waiting for your review";
}

export function FlagRaisedEmail({ name, urgent, url }: { name: string; urgent: boolean; url: string }) {
  return (
    <EmailLayout preview={flagRaisedSubject(urgent)}>
      <Text style={paragraphStyle}>Hello {name},</Text>
      <Text style={paragraphStyle}>
        {urgent
          ? "One of your clients has sent a report that Rampline marks as urgent. Please sign in and look at it today."
          : "One of your clients has sent a report that is waiting for your review."}
      </Text>
      <Button href={url} style={buttonStyle}>
        Open Rampline
      </Button>
    </EmailLayout>
  );
}
