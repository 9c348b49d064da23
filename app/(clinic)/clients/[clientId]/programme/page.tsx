import type { Metadata } from "next";
import Link from "next/link";
import { Notice } from "@/components/ui/notice";
import { getLatestVersionByProgrammeId, getProgrammeByClientId, listTemplatesByOrganizationId } from "@/db/queries/programmes";
import { requirePageClientAccess } from "@/lib/auth/page-guards";
import type { ProgrammeContent } from "@/lib/programmes/content";
import { contentToFormValues, emptyProgramme, type ChannelFormValues, type ProgrammeFormValues } from "@/lib/programmes/form-values";
import { BUILT_IN_TEMPLATES, programmeFromTemplate } from "@/lib/programmes/templates";
import { getPublishingGate } from "@/lib/screening/gate";
import { ProgrammeBuilder } from "./_components/programme-builder";
import { TemplatePicker } from "./_components/template-picker";

export const metadata: Metadata = { title: "Programme" };

function startingValues(start: string | undefined, clinicTemplates: { id: string; content: unknown }[]): ProgrammeFormValues | null {
  if (!start) return null;
  if (start === "blank") return emptyProgramme();
  const builtIn = BUILT_IN_TEMPLATES.find((template) => template.id === start);
  if (builtIn) return programmeFromTemplate(builtIn.channels);
  const clinic = start.startsWith("clinic:") ? clinicTemplates.find((template) => template.id === start.slice(7)) : undefined;
  if (clinic) return programmeFromTemplate((clinic.content as { channels: Omit<ChannelFormValues, "id">[] }).channels);
  return null;
}

// A change proposed from a report or a message carries a link back to it, kept with the version it becomes.
function parsePrompt(prompt: string | undefined): { type: "check-in" | "flag" | "message"; id: string } | undefined {
  const match = /^(check-in|flag|message):([\w-]{1,100})$/.exec(prompt ?? "");
  return match ? { type: match[1] as "check-in" | "flag" | "message", id: match[2]! } : undefined;
}

export default async function ProgrammePage({ params, searchParams }: { params: Promise<{ clientId: string }>; searchParams: Promise<{ start?: string; prompt?: string }> }) {
  const { clientId } = await params;
  const { actor, client } = await requirePageClientAccess(clientId, "therapist", "admin");
  const [programme, clinicTemplates, gate, { start, prompt }] = await Promise.all([
    getProgrammeByClientId(clientId),
    listTemplatesByOrganizationId(actor.organizationId),
    getPublishingGate(clientId),
    searchParams,
  ]);
  const latest = programme ? await getLatestVersionByProgrammeId(programme.id) : null;
  const initial =
    (programme?.draft as ProgrammeFormValues | null) ??
    (latest ? contentToFormValues(latest.content as ProgrammeContent) : null) ??
    startingValues(start, clinicTemplates);
  return (
    <div className="flex flex-col gap-6">
      <div>
        <p>
          <Link href={`/clients/${clientId}`}>← {client.fullName}</Link>
        </p>
        <h1 className="mt-2 text-3xl">Programme for {client.fullName}</h1>
        <p className="mt-1 text-ink-soft">
          {latest ? `Version ${latest.number} is in force. Changes here are a draft until you publish them.` : "Nothing published yet."}{" "}
          {latest ? <Link href={`/clients/${clientId}/programme/versions`}>All versions and what changed</Link> : null}
        </p>
      </div>
      <Notice tone="note" word="The clinician decides">
        Rampline shows figures and findings from published sources and common practice. The settings are yours to
        choose for this client, following the stimulator manufacturer&apos;s instructions, local regulations and your
        licensed practice.
      </Notice>
      {actor.role !== "therapist" ? (
        <Notice tone="note" word="Read only">
          Only therapists write programmes. {latest ? "" : "No programme has been published for this client yet."}
        </Notice>
      ) : initial ? (
        <ProgrammeBuilder
          clientId={clientId}
          initialValues={initial}
          initialRevision={programme?.draftRevision ?? 0}
          hasPublishedVersion={latest !== null}
          screeningReasons={gate.reasons}
          promptedBy={parsePrompt(prompt)}
        />
      ) : (
        <TemplatePicker clientId={clientId} clinicTemplates={clinicTemplates} />
      )}
    </div>
  );
}
