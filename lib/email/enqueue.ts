import type { JobExecutor } from "@/db/transaction";
import { env } from "@/lib/env";
import { getBoss, QUEUES } from "@/lib/jobs/boss";
import type { EmailMessage } from "./messages";

// The request that triggers an e-mail only writes a job; the worker sends it and pg-boss retries it with back-off,
// so a mail service that is down never fails the request or loses the message.
export async function enqueueEmail(message: EmailMessage, options: { jobs?: JobExecutor } = {}): Promise<string> {
  const boss = await getBoss();
  const id = await boss.send(QUEUES.email, message, {
    retryLimit: env().MAIL_RETRY_LIMIT,
    retryDelay: env().MAIL_RETRY_DELAY_SECONDS,
    retryBackoff: true,
    expireInMinutes: 5,
    ...(options.jobs ? { db: options.jobs } : {}),
  });
  if (!id) throw new Error("The e-mail job was not queued.");
  return id;
}
