"use client";
import { useState } from "react";
import { FormAlert } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Choice } from "@/components/ui/choice-fields";
import { Notice } from "@/components/ui/notice";
import { ApiError, sendJson } from "@/lib/api-client";

type Settings = { emailMessages: boolean; emailProgrammeUpdates: boolean; emailFlags: boolean };

export function NotificationForm({ initial, staff }: { initial: Settings; staff: boolean }) {
  const [values, setValues] = useState(initial);
  const [saved, setSaved] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const toggle = (key: keyof Settings) => (event: React.ChangeEvent<HTMLInputElement>) => {
    setSaved(false);
    setValues({ ...values, [key]: event.target.checked });
  };
  async function save(event: React.FormEvent) {
    event.preventDefault();
    setError(null);
    try {
      await sendJson("PUT", "/api/me/notifications", values);
      setSaved(true);
    } catch (caught) {
      setError(caught instanceof ApiError ? caught.message : "The settings were not saved.");
    }
  }
  return (
    <form method="post" onSubmit={(event) => void save(event)} className="flex flex-col gap-3">
      {saved ? (
        <Notice tone="ok" word="Saved" role="status">
          Your e-mail settings are saved.
        </Notice>
      ) : null}
      <FormAlert message={error} />
      <p className="text-ink-soft">E-mails never contain health details: only that there is something to read.</p>
      <Choice type="checkbox" label="E-mail me when there are new messages" hint="At most one e-mail for a burst of messages." checked={values.emailMessages} onChange={toggle("emailMessages")} />
      {!staff ? <Choice type="checkbox" label="E-mail me when the programme is updated" checked={values.emailProgrammeUpdates} onChange={toggle("emailProgrammeUpdates")} /> : null}
      {staff ? (
        <Choice type="checkbox" label="E-mail me when a client's report needs review" hint="Urgent reports are always e-mailed at once." checked={values.emailFlags} onChange={toggle("emailFlags")} />
      ) : null}
      <div>
        <Button type="submit">Save e-mail settings</Button>
      </div>
    </form>
  );
}
