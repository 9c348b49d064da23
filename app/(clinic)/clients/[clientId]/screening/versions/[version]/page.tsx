import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AnswersView } from "@/components/screening/answers-view";
import { ConcernList } from "@/components/screening/concern-list";
import { ScreeningDeferral } from "@/components/screening/deferral";
import { RedFlagList } from "@/components/screening/red-flag-list";
import { VersionFacts } from "@/components/screening/version-facts";
import { Card } from "@/components/ui/card";
import { requirePageClientAccess } from "@/lib/auth/page-guards";
import { AppError } from "@/lib/errors";
import { getScreeningVersion } from "@/lib/screening/read";
import { parseVersionParam } from "@/lib/screening/version-param";

export const metadata: Metadata = { title: "Screening version" };

type Props = { params: Promise<{ clientId: string; version: string }> };

// A signed version, read-only: signed versions never change; a re-screen makes a new one.
export default async function ScreeningVersionPage({ params }: Props) {
  const { clientId, version } = await params;
  const { actor, client } = await requirePageClientAccess(clientId, "therapist", "admin");
  const number = parseVersionParam(version);
  if (number === null) notFound();
  // The layout has already answered 404 for a version that does not exist; the page still stands on its own.
  const summary = await getScreeningVersion(actor, client.id, { version: number }).catch((error: unknown) => {
    if (error instanceof AppError && error.code === "NOT_FOUND") notFound();
    throw error;
  });
  const history = `/clients/${encodeURIComponent(client.id)}/screening`;
  return (
    <div className="flex flex-col gap-6">
      <p>
        <Link href={history}>Back to the screening history</Link>
      </p>
      <h1 className="text-3xl">
        Screening version {summary.version}: {client.fullName}
      </h1>
      <Card title="Signed">
        <VersionFacts summary={summary} />
      </Card>
      <Card title="Systemic red flags">
        <RedFlagList flags={summary.redFlags} />
      </Card>
      <Card title="Concerns from the answers">
        <ConcernList concerns={summary.concerns} />
      </Card>
      <Card title="Answers">
        <AnswersView answers={summary.answers} />
      </Card>
      <ScreeningDeferral />
    </div>
  );
}
