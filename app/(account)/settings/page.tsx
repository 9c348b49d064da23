import type { Metadata } from "next";
import { Card } from "@/components/ui/card";
import { requirePageActor } from "@/lib/auth/page-guards";
import { readNotificationSettings } from "@/lib/notifications/settings";
import { NotificationForm } from "./_components/notification-form";

export const metadata: Metadata = { title: "E-mail settings" };

export default async function SettingsPage() {
  const actor = await requirePageActor();
  const settings = await readNotificationSettings(actor);
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-3xl">E-mail settings</h1>
      <Card>
        <NotificationForm
          staff={actor.role === "admin" || actor.role === "therapist"}
          initial={{ emailMessages: settings.emailMessages, emailProgrammeUpdates: settings.emailProgrammeUpdates, emailFlags: settings.emailFlags }}
        />
      </Card>
    </div>
  );
}
