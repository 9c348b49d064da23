"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { FieldError } from "@/components/ui/text-field";
import { ApiError, sendJson } from "@/lib/api-client";

export function FlagActions({ flagId, status, label }: { flagId: string; status: "open" | "acknowledged"; label: string }) {
  const router = useRouter();
  const noteId = useId();
  const [note, setNote] = useState("");
  const mutation = useMutation({
    mutationFn: (body: { action: "acknowledge" } | { action: "resolve"; note: string }) => sendJson("PATCH", `/api/flags/${encodeURIComponent(flagId)}`, body),
    onSuccess: () => router.refresh(),
  });
  const error = mutation.error instanceof ApiError ? (mutation.error.fields?.note ?? mutation.error.message) : mutation.error ? "That did not work. Try again." : null;
  return (
    <div className="flex flex-col gap-2">
      {status === "open" ? (
        <div>
          <Button type="button" variant="secondary" busy={mutation.isPending} onClick={() => mutation.mutate({ action: "acknowledge" })} aria-label={`Acknowledge: ${label}`}>
            Acknowledge
          </Button>
        </div>
      ) : null}
      <label htmlFor={noteId} className="font-bold">
        How it was resolved
      </label>
      <textarea id={noteId} rows={2} value={note} onChange={(event) => setNote(event.target.value)} className="rounded-md border-2 border-line bg-white px-3 py-2" aria-describedby={error ? `${noteId}-error` : undefined} />
      {error ? <FieldError id={`${noteId}-error`} message={error} /> : null}
      <div>
        <Button type="button" busy={mutation.isPending} onClick={() => mutation.mutate({ action: "resolve", note })} aria-label={`Resolve: ${label}`}>
          Resolve with this note
        </Button>
      </div>
    </div>
  );
}
