import type { Metadata } from "next";
import { EmptyState } from "@/components/ui/card";
import { listCheckInsByClientId } from "@/db/queries/check-ins";
import { requireOwnClient } from "@/lib/auth/own-client";
import { SKIN_SCALE, type SkinLevel } from "@/lib/check-ins/skin-scale";

export const metadata: Metadata = { title: "History" };

const day = new Intl.DateTimeFormat("en-GB", { weekday: "short", day: "numeric", month: "short", timeZone: "UTC" });

export default async function HistoryPage() {
  const { actor, client } = await requireOwnClient();
  const rows = await listCheckInsByClientId(client.id, { limit: 100 });
  return (
    <div className="flex flex-col gap-6">
      <h1 className="text-3xl">{actor.role === "carer" ? `${client.fullName}'s sessions` : "Your sessions"}</h1>
      {rows.length === 0 ? (
        <EmptyState title="No sessions logged yet">After each session, choose “Log a session” on the Today page.</EmptyState>
      ) : (
        <ol className="flex flex-col gap-3">
          {rows.map(({ checkIn, loggedByName, versionNumber }) => {
            const worst = Math.max(...checkIn.skin.map((site) => site.level)) as SkinLevel;
            return (
              <li key={checkIn.id} className="rounded-lg border border-line bg-card p-4">
                <p className="font-bold">{day.format(new Date(checkIn.sessionDate))}</p>
                <p className="tabular-nums">
                  {checkIn.minutes} minutes · comfort {checkIn.comfort}/10 · skin: {SKIN_SCALE[worst].words.toLowerCase()}
                </p>
                <p className="text-sm text-ink-soft">
                  Programme version {versionNumber ?? "?"} · logged by {checkIn.loggedByRole === "carer" ? `${loggedByName} (carer)` : loggedByName}
                </p>
              </li>
            );
          })}
        </ol>
      )}
    </div>
  );
}
