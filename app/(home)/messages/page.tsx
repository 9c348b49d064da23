import type { Metadata } from "next";
import { ThreadView } from "@/components/thread/thread-view";
import { requireOwnClient } from "@/lib/auth/own-client";

export const metadata: Metadata = { title: "Messages" };

export default async function HomeMessagesPage() {
  const { actor, client } = await requireOwnClient();
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-3xl">Messages</h1>
      <p className="text-ink-soft">
        {actor.role === "carer" ? `With ${client.fullName}'s therapists. ${client.fullName} sees these too.` : "With your therapist and the people who help you."} For anything urgent, stop and call
        your clinic.
      </p>
      <ThreadView clientId={client.id} staff={false} canWrite />
    </div>
  );
}
