import "server-only";
import { countMessagesAfter, getNotificationSettingByUserId, getThreadReadByUser, setLastNotifiedAt } from "@/db/queries/messages";
import { getUserById } from "@/db/queries/users";
import { getClientById } from "@/db/queries/clients";
import { getMembershipByUserId } from "@/db/queries/memberships";
import { deliverEmail } from "@/lib/email/deliver";
import { env } from "@/lib/env";
import type { MessageNotifyJob } from "./notify";

// Runs when the quiet period is over: one e-mail if there is anything the person has neither read nor been told about.
export async function deliverMessageNotification(jobId: string, { clientId, userId }: MessageNotifyJob) {
  const [person, client, setting, read] = await Promise.all([getUserById(userId), getClientById(clientId), getNotificationSettingByUserId(userId), getThreadReadByUser(clientId, userId)]);
  if (!person || !client || person.banned || !setting.emailMessages) return { sent: false };
  const since = [read?.lastReadAt, read?.lastNotifiedAt].filter((d): d is Date => d instanceof Date).sort((a, b) => b.getTime() - a.getTime())[0] ?? null;
  // Anything written after this moment is left for the next notification rather than assumed seen.
  const startedAt = new Date();
  if ((await countMessagesAfter(clientId, userId, since)) === 0) return { sent: false };
  const role = (await getMembershipByUserId(person.id))?.role;
  const url = role === "therapist" || role === "admin" ? `${env().APP_URL}/clients/${clientId}/messages` : `${env().APP_URL}/messages`;
  await deliverEmail(jobId, { template: "new-messages", to: person.email, data: { name: person.name, url } });
  await setLastNotifiedAt(clientId, userId, startedAt);
  return { sent: true };
}
