import type { Metadata } from "next";
import Link from "next/link";
import { GuidedSession } from "@/components/guided-session/guided-session";
import { sessionPlanFromVersion, sessionWords } from "@/components/guided-session/session-plan";
import { buttonClasses } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/card";
import { getLatestVersionByProgrammeId, getProgrammeByClientId } from "@/db/queries/programmes";
import { requireOwnClient } from "@/lib/auth/own-client";
import type { ProgrammeContent } from "@/lib/programmes/content";

export const metadata: Metadata = { title: "Guided session" };

// The version in force is the latest published one, as on /programme.
export default async function SessionPage() {
  const { actor, client } = await requireOwnClient();
  const words = sessionWords(actor.role === "carer" ? (client.fullName.split(" ")[0] ?? client.fullName) : null);
  const programme = await getProgrammeByClientId(client.id);
  const version = programme ? await getLatestVersionByProgrammeId(programme.id) : null;
  if (!version) {
    return (
      <div className="flex flex-col gap-6">
        <h1 className="text-3xl">{words.title}</h1>
        <EmptyState title="No programme yet">
          <p>
            {words.Your} therapist has not published a programme yet, so there is no session to follow. When they do,
            you get an e-mail and the session can start from here. Until then, do not use the stimulator unless{" "}
            {words.your} therapist has told you how.
          </p>
        </EmptyState>
        <Link href="/today" className={`${buttonClasses("secondary", true)} no-underline`}>
          Back to Today
        </Link>
      </div>
    );
  }
  const plan = sessionPlanFromVersion({ id: version.id, number: version.number, content: version.content as ProgrammeContent });
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1 className="text-3xl">{words.title}</h1>
        <p className="mt-1 text-ink-soft">
          Version {plan.versionNumber} of {words.your} programme: {plan.minutesPerSession} minutes,{" "}
          {plan.channels.length === 1 ? "1 channel" : `${plan.channels.length} channels`}.
        </p>
      </div>
      <GuidedSession plan={plan} words={words} />
    </div>
  );
}
