"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { sendJson } from "@/lib/api-client";
import type { PackStatus } from "@/lib/electrode-packs/pack-status";

const REASONS = {
  uses: "You have used this pack for the number of sessions your therapist set.",
  "edges-lifting": "You said the edges were lifting. A lifting edge can make the stimulation sting.",
  "poor-sticking": "You said the electrodes were not sticking well.",
} as const;

export function PackCard({ clientId, status, today }: { clientId: string; status: PackStatus; today: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function opened() {
    setBusy(true);
    setError(null);
    try {
      await sendJson("POST", `/api/clients/${encodeURIComponent(clientId)}/electrode-packs`, { openedOn: today });
      router.refresh();
    } catch (caught) {
      setError(caught instanceof Error ? caught.message : "That was not saved.");
    } finally {
      setBusy(false);
    }
  }
  return (
    <Card title="Electrodes">
      {status.replaceNow && status.reason && status.reason !== "no-pack" ? (
        <Notice tone="warning" word="Time for new electrodes">
          {REASONS[status.reason]} Open a new pack before your next session.
        </Notice>
      ) : null}
      <p className="my-3">
        {status.openedOn
          ? `This pack was opened on ${new Date(status.openedOn).toLocaleDateString("en-GB", { day: "numeric", month: "long", timeZone: "UTC" })} and used for ${status.uses} ${status.uses === 1 ? "session" : "sessions"}${status.replaceAfterUses ? ` of ${status.replaceAfterUses}` : ""}.`
          : "Tell us when you open a pack of electrodes, so Rampline can remind you when to change them."}
      </p>
      <Button type="button" variant="secondary" large busy={busy} onClick={() => void opened()}>
        I opened a new pack today
      </Button>
      {error ? (
        <p role="alert" className="mt-2 font-bold text-blocks">
          {error}
        </p>
      ) : null}
    </Card>
  );
}
