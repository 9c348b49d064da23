import type { Metadata } from "next";
import { HandoutPage } from "@/components/handout/handout-page";
import { requireOwnClient } from "@/lib/auth/own-client";
import { getHandoutData } from "@/lib/programmes/handout-data";

export const metadata: Metadata = { title: "Your handout" };

export default async function HomeHandoutPage() {
  const { client } = await requireOwnClient();
  return <HandoutPage data={await getHandoutData(client)} backHref="/programme" backLabel="Your programme" pdfHref={`/api/clients/${client.id}/programme/handout`} />;
}
