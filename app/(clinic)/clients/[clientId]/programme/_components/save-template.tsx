"use client";
import { useState } from "react";
import { useFormContext } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { ApiError, sendJson } from "@/lib/api-client";
import type { ProgrammeFormValues } from "@/lib/programmes/form-values";

// Keeps this programme's channels (without the client's marks and photos) as a starting point for the clinic.
export function SaveTemplate() {
  const { getValues } = useFormContext<ProgrammeFormValues>();
  const [name, setName] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  async function save() {
    setBusy(true);
    setError(null);
    setSaved(null);
    try {
      await sendJson("POST", "/api/programme-templates", { name, channels: getValues("channels") });
      setSaved(name);
      setName("");
    } catch (caught) {
      setError(caught instanceof ApiError ? (caught.fields?.name ?? caught.message) : "The template was not saved.");
    } finally {
      setBusy(false);
    }
  }
  return (
    <details className="rounded-lg border border-line bg-card p-5">
      <summary className="cursor-pointer text-lg font-bold">Keep these channels as a clinic template</summary>
      <div className="mt-4 flex flex-col gap-3">
        <p className="text-sm text-ink-soft">The channels and their settings are kept; this client&apos;s marks and photos are not.</p>
        {saved ? (
          <Notice tone="ok" word="Template saved" role="status">
            “{saved}” is now one of the clinic&apos;s starting points.
          </Notice>
        ) : null}
        <TextField label="Template name" value={name} onChange={(event) => setName(event.target.value)} error={error ?? undefined} />
        <div>
          <Button type="button" variant="secondary" busy={busy} onClick={() => void save()}>
            Save as a clinic template
          </Button>
        </div>
      </div>
    </details>
  );
}
