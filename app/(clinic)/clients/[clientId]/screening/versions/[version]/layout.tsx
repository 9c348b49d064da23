import { notFound } from "next/navigation";
import type { ReactNode } from "react";
import { getScreeningByClientIdAndVersion } from "@/db/queries/screenings";
import { requirePageClientAccess } from "@/lib/auth/page-guards";
import { parseVersionParam } from "@/lib/screening/version-param";

type Props = { children: ReactNode; params: Promise<{ clientId: string; version: string }> };

// A version that does not exist is a real 404: the check sits here, above this page's loading.tsx. The page reads
// the version again (one indexed lookup) because it needs the answers and clearances too.
export default async function Layout({ children, params }: Props) {
  const { clientId, version } = await params;
  const { client } = await requirePageClientAccess(clientId, "therapist", "admin");
  const number = parseVersionParam(version);
  if (number === null || !(await getScreeningByClientIdAndVersion(client.id, number))) notFound();
  return children;
}
