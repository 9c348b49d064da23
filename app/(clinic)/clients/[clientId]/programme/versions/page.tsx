import type { Metadata } from "next";
import Link from "next/link";
import { buttonClasses } from "@/components/ui/button";
import { Card, EmptyState } from "@/components/ui/card";
import { VersionDiff } from "@/components/programme-view/version-diff";
import { getProgrammeByClientId, listVersionsByProgrammeId } from "@/db/queries/programmes";
import { requirePageClientAccess } from "@/lib/auth/page-guards";
import type { ProgrammeContent } from "@/lib/programmes/content";

export const metadata: Metadata = { title: "Programme versions" };

const when = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "Europe/London" });

export default async function VersionsPage({ params, searchParams }: { params: Promise<{ clientId: string }>; searchParams: Promise<{ from?: string; to?: string }> }) {
  const { clientId } = await params;
  const { client } = await requirePageClientAccess(clientId, "therapist", "admin");
  const programme = await getProgrammeByClientId(clientId);
  const versions = programme ? await listVersionsByProgrammeId(programme.id) : [];
  const query = await searchParams;
  const latest = versions[0]?.version.number ?? 0;
  const to = Number(query.to ?? latest);
  const from = Number(query.from ?? to - 1);
  const pick = (n: number) => versions.find((row) => row.version.number === n)?.version;
  const before = pick(from);
  const after = pick(to);
  return (
    <div className="flex flex-col gap-6">
      <p>
        <Link href={`/clients/${clientId}/programme`}>← Programme for {client.fullName}</Link>
      </p>
      <h1 className="text-3xl">Versions of {client.fullName}&apos;s programme</h1>
      {versions.length === 0 ? (
        <EmptyState title="Nothing published yet">Publish a programme from the builder; every version will be listed here.</EmptyState>
      ) : (
        <>
          <Card title={before && after ? `What changed from version ${from} to version ${to}` : "What changed"}>
            {before && after ? (
              <VersionDiff before={before.content as ProgrammeContent} after={after.content as ProgrammeContent} fromNumber={from} toNumber={to} />
            ) : (
              <p className="text-ink-soft">Choose two versions below to compare them.</p>
            )}
          </Card>
          {versions.length > 1 ? (
            <form method="get" className="flex flex-wrap items-end gap-3" aria-label="Compare two versions">
              {(["from", "to"] as const).map((end) => (
                <div key={end} className="flex flex-col gap-1">
                  <label htmlFor={`compare-${end}`} className="font-bold">
                    {end === "from" ? "Compare version" : "with version"}
                  </label>
                  <select id={`compare-${end}`} name={end} defaultValue={String(end === "from" ? from : to)} className="min-h-12 rounded-md border-2 border-line bg-white px-3">
                    {versions.map(({ version }) => (
                      <option key={version.id} value={version.number}>
                        {version.number}
                      </option>
                    ))}
                  </select>
                </div>
              ))}
              <button type="submit" className={buttonClasses("secondary")}>
                Compare
              </button>
            </form>
          ) : null}
          <Card title="All versions">
            <table className="w-full text-left">
              <caption className="sr-only">Published versions, newest first</caption>
              <thead>
                <tr className="border-b border-line">
                  <th scope="col" className="py-2">Version</th>
                  <th scope="col" className="py-2">Published</th>
                  <th scope="col" className="py-2">By</th>
                  <th scope="col" className="py-2">Reason</th>
                  <th scope="col" className="py-2"><span className="sr-only">Compare</span></th>
                </tr>
              </thead>
              <tbody>
                {versions.map(({ version, authorName }) => (
                  <tr key={version.id} className="border-b border-line-soft align-top">
                    <td className="py-2 font-bold tabular-nums">{version.number}</td>
                    <td className="py-2">{when.format(version.publishedAt)}</td>
                    <td className="py-2">{authorName}</td>
                    <td className="py-2">{version.reason}</td>
                    <td className="py-2">
                      {version.number > 1 ? (
                        <Link href={`?from=${version.number - 1}&to=${version.number}`}>Compare with {version.number - 1}</Link>
                      ) : null}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </Card>
        </>
      )}
    </div>
  );
}
