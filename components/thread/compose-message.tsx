"use client";
import { useState } from "react";
import { PhotoPicker } from "@/components/photos/photo-picker";
import { Button } from "@/components/ui/button";
import { FieldError } from "@/components/ui/text-field";
import { ApiError, sendJson } from "@/lib/api-client";

export function ComposeMessage({ clientId, onSent, about }: { clientId: string; onSent: () => void; about?: { type: "check-in" | "flag"; id: string } }) {
  const [body, setBody] = useState("");
  const [photoIds, setPhotoIds] = useState<string[]>([]);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  async function send(event: React.FormEvent) {
    event.preventDefault();
    setBusy(true);
    setError(null);
    try {
      await sendJson("POST", `/api/clients/${encodeURIComponent(clientId)}/messages`, { body, photoIds, ...(about ? { about } : {}) });
      setBody("");
      setPhotoIds([]);
      onSent();
    } catch (caught) {
      setError(caught instanceof ApiError ? (caught.fields?.body ?? caught.fields?.photoIds ?? caught.message) : "The message was not sent.");
    } finally {
      setBusy(false);
    }
  }
  return (
    <form method="post" onSubmit={(event) => void send(event)} noValidate className="flex flex-col gap-3 rounded-lg border-2 border-ink bg-card p-4" aria-label="Write a message">
      <label htmlFor="message-body" className="font-bold">
        Your message
      </label>
      {about ? <p className="text-sm text-ink-soft">This reply will link to the {about.type === "check-in" ? "session log" : "flag"} it is about.</p> : null}
      <textarea
        id="message-body"
        rows={3}
        value={body}
        onChange={(event) => setBody(event.target.value)}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? "message-error" : undefined}
        className="rounded-md border-2 border-line bg-white px-3 py-2 text-lg"
      />
      {error ? <FieldError id="message-error" message={error} /> : null}
      <PhotoPicker clientId={clientId} kind="message" label="Attach photos (optional)" photoIds={photoIds} onChange={setPhotoIds} />
      <div>
        <Button type="submit" large busy={busy}>
          Send
        </Button>
      </div>
    </form>
  );
}
