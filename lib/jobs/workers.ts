import { deliverEmail } from "@/lib/email/deliver";
import type { EmailMessage } from "@/lib/email/messages";
import { getBoss, QUEUES } from "./boss";
import { runDailyRules } from "./daily-rules-job";
import { deliverMessageNotification } from "@/lib/messages/deliver-notification";
import type { MessageNotifyJob } from "@/lib/messages/notify";

// Starts the job handlers in this process. Every web instance may run them: pg-boss hands each job to one worker.
export async function startWorkers(options: { pollingIntervalSeconds?: number } = {}): Promise<void> {
  const boss = await getBoss();
  await boss.work<EmailMessage>(
    QUEUES.email,
    { pollingIntervalSeconds: options.pollingIntervalSeconds ?? 1, batchSize: 1 },
    async (jobs) => {
      for (const job of jobs) await deliverEmail(job.id, job.data);
    },
  );
  await boss.work<MessageNotifyJob>(QUEUES.messageNotify, { pollingIntervalSeconds: options.pollingIntervalSeconds ?? 1, batchSize: 1 }, async (jobs) => {
    for (const job of jobs) await deliverMessageNotification(job.id, job.data);
  });
  // Every morning, clinic time; pg-boss keeps one schedule however many instances ask for it.
  await boss.schedule(QUEUES.dailyRules, "15 7 * * *", {}, { tz: "Europe/London" });
  await boss.work(QUEUES.dailyRules, { pollingIntervalSeconds: 30 }, async () => {
    await runDailyRules();
  });
}
