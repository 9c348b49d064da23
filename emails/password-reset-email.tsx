import { Button, Link, Text } from "@react-email/components";
import { buttonStyle, EmailLayout, paragraphStyle } from "./email-layout";

export function passwordResetSubject(): string {
  return "Reset your Rampline password";
}

export function PasswordResetEmail({ name, url }: { name: string; url: string }) {
  return (
    <EmailLayout preview="A link to choose a new Rampline password">
      <Text style={paragraphStyle}>Hello {name},</Text>
      <Text style={paragraphStyle}>
        Someone asked to reset the password for your Rampline account. If it was you, choose a new password with the
        link below. It works for one hour. If it was not you, ignore this e-mail; your password stays as it is.
      </Text>
      <Button href={url} style={buttonStyle}>
        Choose a new password
      </Button>
      <Text style={{ ...paragraphStyle, fontSize: 14, marginTop: 24 }}>
        If the button does not work, copy this address into your browser: <Link href={url}>{url}</Link>
      </Text>
    </EmailLayout>
  );
}
