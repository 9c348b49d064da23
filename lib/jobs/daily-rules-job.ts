import "server-only";
import { listCheckInsByClientId } from "@/db/queries/check-ins";
import { getClientById } from "@/db/queries/clients";
import { hasUnresolvedFlag, insertFlags } from "@/db/queries/flags";
import { listPublishedSchedules } from "@/db/queries/programmes";
import { getUserById } from "@/db/queries/users";
import { enqueueEmail } from "@/lib/email/enqueue";
import { env } from "@/lib/env";
import type { ProgrammeContent } from "@/lib/programmes/content";
import { dailyFlags } from "@/lib/rules/daily-rules";

const londonDay = (at: Date) => new Intl.DateTimeFormat("en-CA", { timeZone: "Europe/London" }).format(at);

// Runs the daily rules for every client with a programme. A rule that already has an open flag for a client is not
// raised again; each newly flagged client's therapist gets one e-mail.
export async function runDailyRules(now = new Date()): Promise<{ raised: number }> {
  const today = londonDay(now);
  let raised = 0;
  for (const [clientId, rows] of await listPublishedSchedules()) {
    const versions = rows.map((row) => ({ number: row.number, publishedOn: londonDay(row.publishedAt), schedule: (row.content as ProgrammeContent).schedule }));
    const sessions = (await listCheckInsByClientId(clientId)).map(({ checkIn }) => ({ sessionDate: checkIn.sessionDate, minutes: checkIn.minutes }));
    const fresh = [];
    for (const flag of dailyFlags(versions, sessions, today)) if (!(await hasUnresolvedFlag(clientId, flag.rule))) fresh.push(flag);
    if (fresh.length === 0) continue;
    const client = await getClientById(clientId);
    if (!client) continue;
    await insertFlags(fresh.map((flag) => ({ organizationId: client.organizationId, clientId, ...flag })));
    raised += fresh.length;
    const therapist = await getUserById(client.primaryTherapistId);
    if (therapist) {
      await enqueueEmail({ template: "flag-raised", to: therapist.email, data: { name: therapist.name, urgent: false, url: `${env().APP_URL}/clients/${clientId}` } });
    }
  }
  return { raised };
}
