import type { Role } from "@/lib/auth/roles";

// Every e-mail Rampline sends, as the data a job carries. Deliberately no clinical content: e-mails only say that
// there is something to read or do, and link back to the app where the reader signs in.
export type EmailMessage =
  | {
      template: "invitation";
      to: string;
      data: { inviteeName: string; clinicName: string; inviterName: string; role: Role; url: string };
    }
  | { template: "password-reset"; to: string; data: { name: string; url: string } }
  | { template: "programme-updated"; to: string; data: { name: string; clinicName: string; url: string } }
  | { template: "flag-raised"; to: string; data: { name: string; urgent: boolean; url: string } }
  | { template: "new-messages"; to: string; data: { name: string; url: string } };

export type EmailTemplateName = EmailMessage["template"];
