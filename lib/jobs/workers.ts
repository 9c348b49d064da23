import { deliverEmail } from "@/lib/email/deliver";
import type { EmailMessage } from "@/lib/email/messages";
import { getBoss, QUEUES } from "./boss";

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
}
