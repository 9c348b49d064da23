import { Body, Container, Head, Hr, Html, Preview, Section, Text } from "@react-email/components";
import type { ReactNode } from "react";

const ink = "#1b2633";
const paper = "#f7f2e8";

// A plain frame shared by every Rampline e-mail. It carries no clinical detail, only a prompt to sign in.
export function EmailLayout({ preview, children }: { preview: string; children: ReactNode }) {
  return (
    <Html lang="en-GB">
      <Head />
      <Preview>{preview}</Preview>
      <Body style={{ backgroundColor: paper, color: ink, fontFamily: "Verdana, Arial, sans-serif", margin: 0 }}>
        <Container style={{ maxWidth: 560, padding: "32px 24px" }}>
          <Text style={{ fontSize: 20, fontWeight: 700, margin: "0 0 24px" }}>Rampline</Text>
          <Section>{children}</Section>
          <Hr style={{ borderColor: "#cfc4af", margin: "32px 0 16px" }} />
          <Text style={{ fontSize: 13, color: "#445468", lineHeight: "20px" }}>
            For your privacy this e-mail never contains health details. Sign in to Rampline to read anything your
            clinic has shared. If you were not expecting it, you can ignore it.
          </Text>
        </Container>
      </Body>
    </Html>
  );
}

export const buttonStyle = {
  backgroundColor: ink,
  color: "#ffffff",
  padding: "14px 22px",
  borderRadius: 6,
  fontSize: 16,
  fontWeight: 700,
  textDecoration: "none",
  display: "inline-block",
} as const;

export const paragraphStyle = { fontSize: 16, lineHeight: "24px", margin: "0 0 16px" } as const;
