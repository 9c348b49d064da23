import { render } from "@react-email/render";
import { Resend } from "resend";
import { env } from "@/lib/env";
import type { EmailMessage } from "./messages";
import { composeEmail } from "./compose";

let client: Resend | undefined;
function resend(): Resend {
  client ??= new Resend(env().RESEND_API_KEY, env().RESEND_BASE_URL ? { baseUrl: env().RESEND_BASE_URL } : undefined);
  return client;
}

// Sends one queued message. The job id is the idempotency key, so a retry after a lost response never sends twice.
export async function deliverEmail(jobId: string, message: EmailMessage): Promise<string> {
  const { subject, element } = composeEmail(message);
  const [html, text] = await Promise.all([render(element), render(element, { plainText: true })]);
  const { data, error } = await resend().emails.send(
    { from: env().MAIL_FROM, to: [message.to], subject, html, text },
    { idempotencyKey: `rampline-email-${jobId}` },
  );
  if (error || !data) {
    throw new Error(`The mail service refused the message (${error?.name ?? "no answer"}): ${error?.message ?? ""}`);
  }
  return data.id;
}
