import { ProgrammeView } from "@/components/programme-view/programme-view";
import type { ClinicContact } from "@/db/queries/clinics";
import type { ProgrammeContent } from "@/lib/programmes/content";

const longDate = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "Europe/London" });

export type HandoutProps = {
  clientName: string;
  clinicName: string;
  contact: ClinicContact;
  versionNumber: number;
  publishedAt: Date;
  therapistName: string;
  content: ProgrammeContent;
};

// The printable handout: what the client keeps beside their stimulator. The PDF says the same in the same order.
export function HandoutDocument(props: HandoutProps) {
  return (
    <article className="mx-auto flex max-w-4xl flex-col gap-8 bg-white p-6 text-ink print:max-w-none print:p-0">
      <header className="flex flex-col gap-1 border-b-2 border-ink pb-4">
        <p className="text-sm font-bold uppercase tracking-wide text-ink-soft">{props.clinicName} · home stimulation programme</p>
        <h1 className="text-3xl">{props.clientName}</h1>
        <p>
          Version {props.versionNumber}, from {longDate.format(props.publishedAt)}, written by {props.therapistName}.
        </p>
      </header>
      <ProgrammeView content={props.content} />
      <footer className="flex flex-col gap-2 border-t-2 border-ink pt-4 text-sm">
        <p>
          This handout follows the advice of your treating clinician and your stimulator&apos;s instructions from its
          manufacturer. If anything here seems to disagree with them, or something worries you, stop and ask your
          clinic before your next session.
        </p>
        <p className="font-bold">Contact {props.clinicName}</p>
        <p>
          {[props.contact.phone && `Telephone ${props.contact.phone}`, props.contact.email && `E-mail ${props.contact.email}`, props.contact.address]
            .filter(Boolean)
            .join(" · ") || "Ask your therapist for the clinic's contact details."}
        </p>
        <p className="text-ink-soft">Rampline is not a medical device and makes no clinical decisions.</p>
      </footer>
    </article>
  );
}
