import type { Metadata } from "next";
import Link from "next/link";
import { ClearanceForm } from "@/components/screening/clearance-form";
import { ConcernList } from "@/components/screening/concern-list";
import { ScreeningDeferral } from "@/components/screening/deferral";
import { GateNotice } from "@/components/screening/gate-notice";
import { RedFlagList } from "@/components/screening/red-flag-list";
import { VersionFacts } from "@/components/screening/version-facts";
import { VersionTable } from "@/components/screening/version-table";
import { buttonClasses } from "@/components/ui/button";
import { Card, EmptyState } from "@/components/ui/card";
import { Notice } from "@/components/ui/notice";
import { requirePageClientAccess } from "@/lib/auth/page-guards";
import { getPublishingGate } from "@/lib/screening/gate";
import type { RedFlagId } from "@/lib/screening/questions";
import { listScreeningsForClient } from "@/lib/screening/read";

export const metadata: Metadata = { title: "Screening" };

type Props = { params: Promise<{ clientId: string }>; searchParams: Promise<{ signed?: string }> };

export default async function ScreeningHistoryPage({ params, searchParams }: Props) {
  const { clientId } = await params;
  const { actor, client } = await requirePageClientAccess(clientId, "therapist", "admin");
  const [gate, versions, { signed }] = await Promise.all([getPublishingGate(client.id), listScreeningsForClient(actor, client.id), searchParams]);
  const latest = versions[0] ?? null;
  const isTherapist = actor.role === "therapist";
  const base = `/clients/${encodeURIComponent(client.id)}`;
  return (
    <div className="flex flex-col gap-6">
      <p>
        <Link href={base}>Back to {client.fullName}</Link>
      </p>
      <div className="flex flex-wrap items-end justify-between gap-4">
        <h1 className="text-3xl">Screening: {client.fullName}</h1>
        {isTherapist ? (
          <Link href={`${base}/screening/new`} className={buttonClasses("primary")}>
            {latest ? "Screen again" : "Start screening"}
          </Link>
        ) : null}
      </div>
      {signed && latest && String(latest.version) === signed && latest.signedById === actor.userId ? (
        <Notice tone="ok" word="Signed" role="status">
          Version {latest.version} is signed in your name.
        </Notice>
      ) : null}
      <GateNotice gate={gate} />
      {latest ? (
        <Card title={`Latest: version ${latest.version}`}>
          <div className="flex flex-col gap-5">
            <VersionFacts summary={latest} />
            <section className="flex flex-col gap-3">
              <h3 className="text-lg">Systemic red flags</h3>
              <RedFlagList
                flags={latest.redFlags}
                action={(flag) =>
                  isTherapist ? <ClearanceForm clientId={client.id} screeningId={latest.id} flag={flag.id as RedFlagId} flagLabel={flag.label} /> : null
                }
              />
            </section>
            <section className="flex flex-col gap-3">
              <h3 className="text-lg">Concerns from the answers</h3>
              <ConcernList concerns={latest.concerns} />
            </section>
            <p>
              <Link href={`${base}/screening/versions/${latest.version}`}>Read every answer of version {latest.version}</Link>
            </p>
          </div>
        </Card>
      ) : (
        <EmptyState title="Not screened yet">
          {isTherapist ? "Start a screening: a programme cannot be published until one is signed." : "A therapist of the clinic signs the first screening."}
        </EmptyState>
      )}
      {versions.length > 0 ? (
        <Card title="All versions">
          <VersionTable clientId={client.id} versions={versions} />
        </Card>
      ) : null}
      <ScreeningDeferral />
    </div>
  );
}
