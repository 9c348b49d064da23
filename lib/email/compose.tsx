import type { ReactElement } from "react";
import { FlagRaisedEmail, flagRaisedSubject } from "@/emails/flag-raised-email";
import { InvitationEmail, invitationSubject } from "@/emails/invitation-email";
import { NewMessagesEmail, newMessagesSubject } from "@/emails/new-messages-email";
import { PasswordResetEmail, passwordResetSubject } from "@/emails/password-reset-email";
import { ProgrammeUpdatedEmail, programmeUpdatedSubject } from "@/emails/programme-updated-email";
import type { EmailMessage } from "./messages";

export function composeEmail(message: EmailMessage): { subject: string; element: ReactElement } {
  switch (message.template) {
    case "invitation":
      return { subject: invitationSubject(message.data), element: <InvitationEmail {...message.data} /> };
    case "password-reset":
      return { subject: passwordResetSubject(), element: <PasswordResetEmail {...message.data} /> };
    case "flag-raised":
      return { subject: flagRaisedSubject(message.data.urgent), element: <FlagRaisedEmail {...message.data} /> };
    case "new-messages":
      return { subject: newMessagesSubject(), element: <NewMessagesEmail {...message.data} /> };
    case "programme-updated":
      return { subject: programmeUpdatedSubject(), element: <ProgrammeUpdatedEmail {...message.data} /> };
  }
}
