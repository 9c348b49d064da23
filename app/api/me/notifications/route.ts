import { route } from "@/lib/http/route";
import { notificationSettingsSchema, saveNotificationSettings } from "@/lib/notifications/settings";

export const PUT = route({ roles: ["admin", "therapist", "client", "carer"], body: notificationSettingsSchema }, ({ actor, data }) => saveNotificationSettings(actor, data));
