import PgBoss from "pg-boss";
import { env } from "@/lib/env";

// Queue names are the contract between whoever enqueues a job and the worker that runs it.
export const QUEUES = { email: "email", dailyRules: "daily-rules", messageNotify: "message-notify" } as const;

// "short": at most one waiting job per key, so a burst of messages to one person becomes one notification job.
const QUEUE_POLICIES: Partial<Record<(typeof QUEUES)[keyof typeof QUEUES], "short">> = { "message-notify": "short" };

const globalForBoss = globalThis as unknown as { ramplineBoss?: Promise<PgBoss> };

async function startBoss(): Promise<PgBoss> {
  const boss = new PgBoss({ connectionString: env().DATABASE_URL, max: 4, application_name: "rampline-jobs" });
  boss.on("error", (error) => console.error("[jobs] pg-boss error:", error));
  await boss.start();
  for (const name of Object.values(QUEUES)) {
    await boss.createQueue(name, { name, ...(QUEUE_POLICIES[name] ? { policy: QUEUE_POLICIES[name] } : {}) });
  }
  return boss;
}

export { QUEUE_POLICIES };

export function getBoss(): Promise<PgBoss> {
  globalForBoss.ramplineBoss ??= startBoss().catch((error) => {
    globalForBoss.ramplineBoss = undefined;
    throw error;
  });
  return globalForBoss.ramplineBoss;
}

export async function stopBoss(): Promise<void> {
  const pending = globalForBoss.ramplineBoss;
  globalForBoss.ramplineBoss = undefined;
  if (pending) await (await pending).stop({ graceful: true, wait: true });
}
