import Link from "next/link";
import { buttonClasses } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";

export type SavedCheckIn = { checkInId: string; flags: { id: string; severity: "review" | "urgent"; title: string }[]; stopMessage: string | null };

// What the client sees straight after saving: the stop message comes first and in full when the report is urgent.
export function CheckInResult({ saved, clinicPhone }: { saved: SavedCheckIn; clinicPhone: string | null }) {
  return (
    <div className="flex flex-col gap-6">
      {saved.stopMessage ? (
        <Notice tone="blocks" word="Stop" title="Do not use the stimulator on that site" role="alert">
          <p className="text-lg">{saved.stopMessage}</p>
          {clinicPhone ? (
            <p className="mt-2 text-lg font-bold">
              Your clinic: <a href={`tel:${clinicPhone.replace(/\s/g, "")}`}>{clinicPhone}</a>
            </p>
          ) : null}
        </Notice>
      ) : null}
      <Notice tone="ok" word="Saved" role="status">
        Your session is in your record.{" "}
        {saved.flags.length > 0 ? "Your therapist has been told and will look at it." : "Thank you."}
      </Notice>
      <div className="flex flex-wrap gap-3">
        <Link href="/today" className={buttonClasses("primary", true)}>
          Back to today
        </Link>
        <Link href="/history" className={buttonClasses("secondary", true)}>
          Your history
        </Link>
      </div>
    </div>
  );
}
