"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useEffect, useRef } from "react";
import type { ThreadMessage } from "@/lib/messages/read-thread";
import { ComposeMessage } from "./compose-message";

const when = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit", timeZone: "Europe/London" });
export const threadKey = (clientId: string) => ["thread", clientId] as const;

async function fetchThread(clientId: string): Promise<{ messages: ThreadMessage[]; lastReadAt: string | null }> {
  const response = await fetch(`/api/clients/${encodeURIComponent(clientId)}/messages`, { cache: "no-store" });
  if (!response.ok) throw new Error("The messages could not be loaded.");
  return response.json();
}

function aboutLink(about: ThreadMessage["about"], clientId: string, staff: boolean) {
  if (!about) return null;
  if (about.type === "check-in" && staff) return { href: `/clients/${clientId}/check-ins/${about.id}`, label: "About a session log" };
  if (about.type === "version") return { href: staff ? `/clients/${clientId}/programme/versions` : "/programme", label: "About a programme change" };
  if (about.type === "flag" && staff) return { href: `/review`, label: "About a flag" };
  return { href: staff ? `/clients/${clientId}` : "/history", label: about.type === "check-in" ? "About one of your sessions" : "About a report" };
}

// One client's thread, refreshed while open; reading it marks it read. The server prefetches the first page.
export function ThreadView({ clientId, staff, canWrite, about }: { clientId: string; staff: boolean; canWrite: boolean; about?: { type: "check-in" | "flag"; id: string } }) {
  const queryClient = useQueryClient();
  const thread = useQuery({ queryKey: threadKey(clientId), queryFn: () => fetchThread(clientId), refetchInterval: 5000 });
  const markRead = useMutation({ mutationFn: () => fetch(`/api/clients/${encodeURIComponent(clientId)}/messages/read`, { method: "POST" }) });
  const newest = thread.data?.messages.at(-1)?.id;
  const endRef = useRef<HTMLLIElement>(null);
  const { mutate } = markRead;
  useEffect(() => {
    if (newest) {
      mutate();
      endRef.current?.scrollIntoView({ block: "nearest" });
    }
  }, [newest, mutate]);
  if (thread.isPending) return <p role="status">Loading the messages…</p>;
  if (thread.isError) return <p role="alert">The messages could not be loaded. They will be tried again in a moment.</p>;
  const { messages } = thread.data;
  return (
    <div className="flex flex-col gap-4">
      {messages.length === 0 ? <p className="text-ink-soft">No messages yet. Write the first one below.</p> : null}
      <ol className="flex flex-col gap-3" aria-label="Messages, oldest first" aria-live="polite">
        {messages.map((message) => {
          const link = aboutLink(message.about, clientId, staff);
          return (
            <li key={message.id} className={`rounded-lg border p-3 ${message.kind === "system" ? "border-note bg-note-bg" : message.mine ? "border-ink bg-card sm:ml-12" : "border-line bg-card sm:mr-12"}`}>
              <p className="text-sm text-ink-soft">
                {message.kind === "system" ? "Rampline" : message.mine ? "You" : message.authorName} · {when.format(new Date(message.createdAt))}
              </p>
              <p className="whitespace-pre-wrap">{message.body}</p>
              {message.photoIds.length > 0 ? (
                <ul className="mt-2 flex flex-wrap gap-2">
                  {message.photoIds.map((id, index) => (
                    <li key={id}>
                      <a href={`/api/photos/${encodeURIComponent(id)}`}>
                        {/* eslint-disable-next-line @next/next/no-img-element -- private, authorised images */}
                        <img src={`/api/photos/${encodeURIComponent(id)}?size=thumb`} alt={`Attached photo ${index + 1}`} className="size-24 rounded border border-line object-cover" />
                      </a>
                    </li>
                  ))}
                </ul>
              ) : null}
              {link || (staff && canWrite && message.kind === "message") ? (
                <p className="mt-1 flex flex-wrap gap-4 text-sm">
                  {link ? <Link href={link.href}>{link.label}</Link> : null}
                  {staff && canWrite && message.kind === "message" ? (
                    <Link href={`/clients/${clientId}/programme?prompt=message:${message.id}`}>Propose a change from this message</Link>
                  ) : null}
                </p>
              ) : null}
            </li>
          );
        })}
        <li ref={endRef} aria-hidden className="h-0" />
      </ol>
      {canWrite ? <ComposeMessage clientId={clientId} about={about} onSent={() => void queryClient.invalidateQueries({ queryKey: threadKey(clientId) })} /> : null}
    </div>
  );
}
