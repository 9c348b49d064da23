import type { Metadata } from "next";
import Link from "next/link";
import { ThreadView } from "@/components/thread/thread-view";
import { requirePageClientAccess } from "@/lib/auth/page-guards";

export const metadata: Metadata = { title: "Messages" };

export default async function ClientMessagesPage({ params }: { params: Promise<{ clientId: string }> }) {
  const { clientId } = await params;
  const { actor, client } = await requirePageClientAccess(clientId, "therapist", "admin");
  return (
    <div className="flex flex-col gap-6">
      <p>
        <Link href={`/clients/${client.id}`}>← {client.fullName}</Link>
      </p>
      <h1 className="text-3xl">Messages with {client.fullName}</h1>
      <p className="text-ink-soft">The client, their carers and the clinic&apos;s therapists see this thread.</p>
      <ThreadView clientId={client.id} staff canWrite={actor.role === "therapist"} />
    </div>
  );
}
