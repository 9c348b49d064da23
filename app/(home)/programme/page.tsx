import type { Metadata } from "next";
import Link from "next/link";
import { ProgrammeView } from "@/components/programme-view/programme-view";
import { VersionDiff } from "@/components/programme-view/version-diff";
import { buttonClasses } from "@/components/ui/button";
import { Card, EmptyState } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { getProgrammeByClientId, listVersionsByProgrammeId } from "@/db/queries/programmes";
import { requireOwnClient } from "@/lib/auth/own-client";
import { confirmationStatus } from "@/lib/confirmations/read-confirmations";
import { ConfirmVersion } from "./_components/confirm-version";
import type { ProgrammeContent } from "@/lib/programmes/content";

export const metadata: Metadata = { title: "Your programme" };

const longDate = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "Europe/London" });

export default async function HomeProgrammePage() {
  const { actor, client } = await requireOwnClient();
  const programme = await getProgrammeByClientId(client.id);
  const versions = programme ? await listVersionsByProgrammeId(programme.id) : [];
  const [current, previous] = versions;
  const whose = actor.role === "carer" ? `${client.fullName}'s` : "Your";
  const confirmations = current ? await confirmationStatus(client.id, current.version.id) : null;
  if (!current) {
    return (
      <EmptyState title="No programme yet">
        {whose} therapist has not published a programme yet. When they do, it appears here and you get an e-mail.
      </EmptyState>
    );
  }
  return (
    <div className="flex flex-col gap-6">
      <div>
        <h1 className="text-3xl">{whose} programme</h1>
        <p className="mt-1 text-ink-soft">
          Version {current.version.number}, from {longDate.format(current.version.publishedAt)}, by {current.authorName}.
        </p>
      </div>
      {confirmations?.anyConfirmed ? (
        <Notice tone="ok" word="Stimulator set">
          {confirmations.confirmed.map((c) => `${c.name} confirmed on ${longDate.format(c.at)}`).join("; ")} that the stimulator matches version {current.version.number}.
        </Notice>
      ) : (
        <ConfirmVersion clientId={client.id} versionNumber={current.version.number} />
      )}
      {previous ? (
        <Card title={`What changed in version ${current.version.number}`}>
          <p className="mb-3">{current.version.reason}</p>
          <VersionDiff
            before={previous.version.content as ProgrammeContent}
            after={current.version.content as ProgrammeContent}
            fromNumber={previous.version.number}
            toNumber={current.version.number}
          />
        </Card>
      ) : null}
      <Notice tone="warning" word="Safety first">
        Set your stimulator to match these settings, starting with the strength at zero. If anything here disagrees with
        your stimulator&apos;s instructions, or something hurts, stop and contact your clinic.
      </Notice>
      <div>
        <Link href="/programme/handout" className={buttonClasses("secondary", true)}>
          Open the printable handout
        </Link>
      </div>
      <ProgrammeView content={current.version.content as ProgrammeContent} />
    </div>
  );
}
