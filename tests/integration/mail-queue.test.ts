import { mkdtemp } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createMailFake, type MailFake } from "@/fakes/mail/app";
import { pool } from "@/db/client";
import { env } from "@/lib/env";
import { deliverEmail } from "@/lib/email/deliver";
import { enqueueEmail } from "@/lib/email/enqueue";
import { inviteTherapist } from "@/lib/invitations/invite-therapist";
import { postMessage } from "@/lib/messages/post-message";
import { stopBoss } from "@/lib/jobs/boss";
import { startWorkers } from "@/lib/jobs/workers";
import { createClinic, createPerson, uniqueSuffix } from "../support/factories";

// The worker sends to RESEND_BASE_URL (set per run in tests/support/integration-setup.ts); the fake is started and
// stopped on that port to play a mail service that goes down and comes back.
const port = Number(new URL(env().RESEND_BASE_URL!).port);
let storePath: string;
let fake: MailFake | undefined;

async function startFake() {
  fake = await createMailFake({ apiKey: env().RESEND_API_KEY, storePath, port, host: "127.0.0.1", log: () => undefined });
}

async function stopFake() {
  await fake?.close();
  fake = undefined;
}

async function waitUntil(check: () => boolean | Promise<boolean>, timeoutMs: number) {
  const started = Date.now();
  while (Date.now() - started < timeoutMs) {
    if (await check()) return true;
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  return false;
}

const delivered = (to: string) => (fake ? fake.messages().filter((message) => message.to.includes(to)) : []);

// pg-boss keeps its jobs in PostgreSQL; reading the row shows whether a failed send is waiting to be retried.
async function emailJob(to: string) {
  const { rows } = await pool().query<{ state: string; retry_count: number }>(
    "SELECT state, retry_count FROM pgboss.job WHERE name = 'email' AND data->>'to' = $1",
    [to],
  );
  return rows[0];
}

beforeAll(async () => {
  storePath = join(await mkdtemp(join(tmpdir(), "rampline-mail-")), "store.json");
  await startWorkers({ pollingIntervalSeconds: 0.5 });
});

afterAll(async () => {
  await stopFake();
  await stopBoss();
});

describe("e-mail through the queue", () => {
  it("delivers a queued message to the mail service with its rendered content", async () => {
    await startFake();
    const to = `queue-${uniqueSuffix()}@test.example`;
    await enqueueEmail({ template: "password-reset", to, data: { name: "Queue Tester", url: "http://127.0.0.1:3000/reset-password?token=abc" } });
    expect(await waitUntil(() => delivered(to).length === 1, 15_000)).toBe(true);
    const [message] = delivered(to);
    expect(message!.subject).toBe("Reset your Rampline password");
    expect(message!.html).toContain("reset-password?token=abc");
    expect(message!.text).toContain("Choose a new password");
    await stopFake();
  });

  it("sends a retried job only once, because the job id is the idempotency key", async () => {
    await startFake();
    const to = `twice-${uniqueSuffix()}@test.example`;
    const message = { template: "password-reset", to, data: { name: "Retry Tester", url: "http://127.0.0.1:3000/x" } } as const;
    const jobId = crypto.randomUUID();
    const first = await deliverEmail(jobId, message);
    const second = await deliverEmail(jobId, message);
    expect(second).toBe(first);
    expect(delivered(to)).toHaveLength(1);
    await stopFake();
  });

  it("still accepts an invitation while the mail service is down, and the mail arrives once when it is back", async () => {
    await stopFake();
    const clinic = await createClinic();
    const admin = await createPerson(clinic, "admin");
    const to = `outage-${uniqueSuffix()}@test.example`;

    const { invitationId } = await inviteTherapist(admin, { name: "Patient Person", email: to });
    expect(invitationId).toBeTruthy();

    // With nothing listening, the worker's attempt fails and pg-boss schedules a retry rather than dropping the job.
    expect(await waitUntil(async () => (await emailJob(to))?.state === "retry", 15_000)).toBe(true);
    expect(delivered(to)).toHaveLength(0);

    await startFake();
    expect(await waitUntil(() => delivered(to).length > 0, 30_000)).toBe(true);
    // Give any duplicate a chance to show up before counting.
    await new Promise((resolve) => setTimeout(resolve, 2500));
    expect(delivered(to)).toHaveLength(1);
    expect(delivered(to)[0]!.subject).toContain(clinic.clinicName);
  });
});

describe("message notifications", () => {
  it("coalesce a burst of ten messages into one e-mail per recipient, and lose none while the mail service is down", async () => {
    await stopFake();
    const clinic = await createClinic("Messaging clinic");
    const therapist = await createPerson(clinic, "therapist");
    const client = await createPerson(clinic, "client", { therapistId: therapist.userId });
    const carer = await createPerson(clinic, "carer", { clientId: client.clientId! });

    for (let n = 1; n <= 5; n++) await postMessage(client, client.clientId!, { body: `Message ${n}` });
    // The quiet period (2 s in the tests) passes with nothing listening: the attempts fail and wait to be retried.
    await new Promise((resolve) => setTimeout(resolve, 3000));
    for (let n = 6; n <= 10; n++) await postMessage(client, client.clientId!, { body: `Message ${n}` });
    await startFake();

    const subject = "You have new messages in Rampline";
    const received = (to: string) => delivered(to).filter((m) => m.subject === subject);
    expect(await waitUntil(() => received(therapist.email).length > 0 && received(carer.email).length > 0, 30_000)).toBe(true);
    // Give a second e-mail every chance to appear before counting.
    await new Promise((resolve) => setTimeout(resolve, 5000));
    expect(received(therapist.email)).toHaveLength(1);
    expect(received(carer.email)).toHaveLength(1);
    expect(received(client.email)).toHaveLength(0);
    expect(received(carer.email)[0]!.html).not.toContain("Message 1");
  });
});

