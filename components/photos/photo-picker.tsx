"use client";
import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { FieldError } from "@/components/ui/text-field";

type Kind = "placement" | "skin" | "message";
type Uploaded = { id: string; thumbnailUrl: string };

const thumbnailUrl = (photoId: string) => `/api/photos/${encodeURIComponent(photoId)}?size=thumb`;

// Chooses and uploads photos through the one upload route; the server decides the file type by its content,
// re-encodes it without metadata and keeps it private. The parent keeps only the ids.
export function PhotoPicker({
  clientId,
  kind,
  photoIds,
  onChange,
  max = 4,
  label,
  advice,
  disabled = false,
}: {
  clientId: string;
  kind: Kind;
  photoIds: string[];
  onChange: (ids: string[]) => void;
  max?: number;
  label: string;
  advice?: string;
  disabled?: boolean;
}) {
  const inputId = useId();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function upload(file: File) {
    setBusy(true);
    setError(null);
    const body = new FormData();
    body.append("kind", kind);
    body.append("photo", file);
    try {
      const response = await fetch(`/api/clients/${encodeURIComponent(clientId)}/photos`, { method: "POST", body });
      const payload = (await response.json().catch(() => null)) as (Uploaded & { error?: { message: string } }) | null;
      if (!response.ok || !payload?.id) throw new Error(payload?.error?.message ?? "The photo could not be uploaded. Please try again.");
      onChange([...photoIds, payload.id]);
    } catch (caught) {
      setError(caught instanceof Error ? caught.message : "The photo could not be uploaded.");
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex flex-col gap-2">
      <label htmlFor={inputId} className="font-bold">
        {label}
      </label>
      {advice ? <p className="text-sm text-ink-soft">{advice}</p> : null}
      {photoIds.length > 0 ? (
        <ul className="flex flex-wrap gap-3">
          {photoIds.map((id, index) => (
            <li key={id} className="flex flex-col items-center gap-1">
              {/* eslint-disable-next-line @next/next/no-img-element -- private, authorised images are not for next/image's public optimiser */}
              <img src={thumbnailUrl(id)} alt={`Photo ${index + 1}`} className="size-24 rounded border border-line object-cover" />
              {!disabled ? (
                <Button type="button" variant="quiet" onClick={() => onChange(photoIds.filter((other) => other !== id))} aria-label={`Remove photo ${index + 1}`}>
                  Remove
                </Button>
              ) : null}
            </li>
          ))}
        </ul>
      ) : null}
      {!disabled && photoIds.length < max ? (
        <input
          id={inputId}
          type="file"
          accept="image/jpeg,image/png,image/webp"
          disabled={busy}
          aria-describedby={error ? `${inputId}-error` : undefined}
          className="min-h-11 text-base file:mr-3 file:min-h-11 file:rounded-md file:border-2 file:border-ink file:bg-card file:px-4 file:font-bold"
          onChange={(event) => {
            const file = event.target.files?.[0];
            event.target.value = "";
            if (file) void upload(file);
          }}
        />
      ) : null}
      {busy ? (
        <p role="status" className="text-sm text-ink-soft">
          Uploading…
        </p>
      ) : null}
      {error ? <FieldError id={`${inputId}-error`} message={error} /> : null}
    </div>
  );
}
