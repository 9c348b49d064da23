import "server-only";
import type { JobExecutor } from "@/db/transaction";
import { env } from "@/lib/env";
import { getBoss, QUEUES } from "@/lib/jobs/boss";

export type MessageNotifyJob = { clientId: string; userId: string };

// Asks for one "you have new messages" e-mail to one person after the quiet period. The queue keeps at most one
// waiting job per person and thread, so a burst of messages is coalesced; the job decides at send time whether
// anything is still unread, so nothing is dropped and nothing is sent twice.
export async function queueMessageNotification(job: MessageNotifyJob, jobs?: JobExecutor) {
  const boss = await getBoss();
  await boss.send(QUEUES.messageNotify, job, {
    singletonKey: `${job.clientId}:${job.userId}`,
    startAfter: env().MESSAGE_QUIET_SECONDS,
    retryLimit: env().MAIL_RETRY_LIMIT,
    retryDelay: env().MAIL_RETRY_DELAY_SECONDS,
    retryBackoff: true,
    ...(jobs ? { db: jobs } : {}),
  });
}
