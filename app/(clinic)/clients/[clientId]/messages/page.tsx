import type { Metadata } from "next";
import Link from "next/link";
import { ThreadView } from "@/components/thread/thread-view";
import { requirePageClientAccess } from "@/lib/auth/page-guards";

export const metadata: Metadata = { title: "Messages" };

// ?about=check-in:<id> (or flag:<id>) starts a reply that links back to the report it is about.
function parseAbout(about: string | undefined): { type: "check-in" | "flag"; id: string } | undefined {
  const match = /^(check-in|flag):([\w-]{1,100})$/.exec(about ?? "");
  return match ? { type: match[1] as "check-in" | "flag", id: match[2]! } : undefined;
}

export default async function ClientMessagesPage({ params, searchParams }: { params: Promise<{ clientId: string }>; searchParams: Promise<{ about?: string }> }) {
  const { clientId } = await params;
  const about = parseAbout((await searchParams).about);
  const { actor, client } = await requirePageClientAccess(clientId, "therapist", "admin");
  return (
    <div className="flex flex-col gap-6">
      <p>
        <Link href={`/clients/${client.id}`}>← {client.fullName}</Link>
      </p>
      <h1 className="text-3xl">Messages with {client.fullName}</h1>
      <p className="text-ink-soft">The client, their carers and the clinic&apos;s therapists see this thread.</p>
      <ThreadView clientId={client.id} staff canWrite={actor.role === "therapist"} about={about} />
    </div>
  );
}
