import "server-only";
import { z } from "zod";
import { getNotificationSettingByUserId, upsertNotificationSetting } from "@/db/queries/messages";
import type { Actor } from "@/lib/auth/actor";
import { parseInput } from "@/lib/validation";

export const notificationSettingsSchema = z.object({
  emailMessages: z.boolean({ error: "Say whether to e-mail you about new messages." }),
  emailProgrammeUpdates: z.boolean({ error: "Say whether to e-mail you about programme updates." }),
  emailFlags: z.boolean({ error: "Say whether to e-mail you about flags." }),
});

export const readNotificationSettings = (actor: Actor) => getNotificationSettingByUserId(actor.userId);

export async function saveNotificationSettings(actor: Actor, input: z.input<typeof notificationSettingsSchema>) {
  const data = parseInput(notificationSettingsSchema, input);
  await upsertNotificationSetting(actor.userId, data);
  return data;
}
