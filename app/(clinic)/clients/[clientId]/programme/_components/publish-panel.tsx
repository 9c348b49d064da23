"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { ApiError, sendJson } from "@/lib/api-client";
import type { ChannelReport } from "@/lib/programmes/analyse";
import type { useDraftAutosave } from "./use-draft-autosave";

type Result = { number: number; changes: string[] };

// What still stops publishing is listed as the therapist works; the server checks the same things again.
const PROMPT_WORDS = { "check-in": "a session log", flag: "a flag", message: "a message" } as const;

export function PublishPanel({ clientId, autosave, reports, contentErrors, screeningReasons, promptedBy }: {
  clientId: string;
  autosave: ReturnType<typeof useDraftAutosave>;
  reports: ChannelReport[];
  contentErrors: Record<string, string>;
  screeningReasons: string[];
  promptedBy?: { type: "check-in" | "flag" | "message"; id: string };
}) {
  const router = useRouter();
  const [reason, setReason] = useState("");
  const [busy, setBusy] = useState(false);
  const [refusal, setRefusal] = useState<{ message: string; reasons: string[] } | null>(null);
  const [published, setPublished] = useState<Result | null>(null);
  const blocking = [
    ...reports.flatMap((report) => report.blocking.map((finding) => `Channel ${report.number}: ${finding.title}.`)),
    ...Object.values(contentErrors).slice(0, 8),
    ...screeningReasons,
  ];

  async function publish() {
    setBusy(true);
    setRefusal(null);
    setPublished(null);
    try {
      if (!(await autosave.save())) throw new ApiError(409, "CONFLICT", "Save the draft before publishing.");
      const result = await sendJson<Result>("POST", `/api/clients/${encodeURIComponent(clientId)}/programme/versions`, {
        reason,
        baseRevision: autosave.revision.current,
        ...(promptedBy ? { promptedBy } : {}),
      });
      setPublished(result);
      setReason("");
      router.refresh();
    } catch (error) {
      if (error instanceof ApiError) setRefusal({ message: error.fields?.reason ?? error.message, reasons: error.reasons ?? [] });
      else setRefusal({ message: "Publishing did not work. Please try again.", reasons: [] });
    } finally {
      setBusy(false);
    }
  }

  return (
    <section aria-labelledby="publish-heading" className="rounded-lg border-2 border-ink bg-card p-5">
      <h2 id="publish-heading" className="text-2xl">
        Publish
      </h2>
      <p className="mt-1 text-ink-soft">
        Publishing makes this the version in force: it cannot be changed afterwards, the client and carers are e-mailed
        that there is an update, and the reason is kept with it.
      </p>
      {promptedBy ? (
        <p className="mt-2 font-bold">This version will be linked to {PROMPT_WORDS[promptedBy.type]} that prompted it, on the client&apos;s timeline.</p>
      ) : null}
      {blocking.length > 0 ? (
        <div className="mt-4">
          <Notice tone="blocks" title="Still to sort out before publishing">
            <ul className="list-disc pl-5">
              {[...new Set(blocking)].map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
          </Notice>
        </div>
      ) : null}
      <div className="mt-4 flex flex-col gap-1">
        <label htmlFor="publish-reason" className="font-bold">
          Reason for this version
        </label>
        <p id="publish-reason-hint" className="text-sm text-ink-soft">
          For example: first programme after screening; or: skin redness at electrode A, pulse duration reduced.
        </p>
        <textarea
          id="publish-reason"
          aria-describedby="publish-reason-hint"
          rows={2}
          value={reason}
          onChange={(event) => setReason(event.target.value)}
          className="min-h-12 rounded-md border-2 border-line bg-white px-3 py-2"
        />
      </div>
      {refusal ? (
        <div className="mt-4">
          <Notice tone="blocks" word="Not published" role="alert">
            {refusal.message}
            {refusal.reasons.length > 0 ? (
              <ul className="mt-1 list-disc pl-5">
                {refusal.reasons.map((line) => (
                  <li key={line}>{line}</li>
                ))}
              </ul>
            ) : null}
          </Notice>
        </div>
      ) : null}
      {published ? (
        <div className="mt-4">
          <Notice tone="ok" word={`Version ${published.number} published`} role="status">
            {published.changes.length > 0 ? (
              <ul className="list-disc pl-5">
                {published.changes.map((line) => (
                  <li key={line}>{line}</li>
                ))}
              </ul>
            ) : (
              "The client and carers have been told there is an update."
            )}
          </Notice>
        </div>
      ) : null}
      <Button type="button" large className="mt-4" busy={busy} onClick={() => void publish()}>
        Publish this version
      </Button>
    </section>
  );
}
