import { Button, Text } from "@react-email/components";
import { buttonStyle, EmailLayout, paragraphStyle } from "./email-layout";

// One e-mail for a burst of messages, saying only that there is something to read.
export function newMessagesSubject(): string {
  return "You have new messages in Rampline";
}

export function NewMessagesEmail({ name, url }: { name: string; url: string }) {
  return (
    <EmailLayout preview="New messages are waiting for you">
      <Text style={paragraphStyle}>Hello {name},</Text>
      <Text style={paragraphStyle}>There are new messages for you in Rampline. Sign in to read and reply.</Text>
      <Button href={url} style={buttonStyle}>
        Read the messages
      </Button>
    </EmailLayout>
  );
}
