import type { Metadata } from "next";
import { HandoutPage } from "@/components/handout/handout-page";
import { requirePageClientAccess } from "@/lib/auth/page-guards";
import { getHandoutData } from "@/lib/programmes/handout-data";

export const metadata: Metadata = { title: "Handout" };

export default async function ClinicHandoutPage({ params }: { params: Promise<{ clientId: string }> }) {
  const { clientId } = await params;
  const { client } = await requirePageClientAccess(clientId, "therapist", "admin");
  return (
    <HandoutPage
      data={await getHandoutData(client)}
      backHref={`/clients/${clientId}`}
      backLabel={client.fullName}
      pdfHref={`/api/clients/${clientId}/programme/handout`}
    />
  );
}
