import { BodyOutline } from "@/components/body-outline";
import { CycleRibbon } from "@/components/stim-picture";
import type { ProgrammeContent } from "@/lib/programmes/content";
import { SIDE_LABELS } from "@/lib/programmes/labels";
import { scheduleInWords, settingsRows } from "./plain-words";

// Review dates are calendar days stored as yyyy-mm-dd (read as midnight UTC), so they are formatted in UTC.
const longDate = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" });
const photoUrl = (id: string) => `/api/photos/${encodeURIComponent(id)}`;

// One published version, as the client and carer see it in the app and on the printed handout. Server-rendered;
// no interaction, so it prints as it looks.
export function ProgrammeView({ content, headingLevel = 2 }: { content: ProgrammeContent; headingLevel?: 2 | 3 }) {
  const H = headingLevel === 2 ? "h2" : "h3";
  const Sub = headingLevel === 2 ? "h3" : "h4";
  return (
    <div className="flex flex-col gap-8">
      <section>
        <H className="text-2xl">When</H>
        <p className="mt-2">{scheduleInWords(content.schedule)}</p>
        <p>Your therapist will review the programme with you on {longDate.format(new Date(content.schedule.reviewOn))}.</p>
      </section>
      {content.channels.map((channel, index) => (
        <section key={channel.id} className="break-inside-avoid-page">
          <H className="text-2xl">
            Channel {index + 1}: {channel.target} ({SIDE_LABELS[channel.side].toLowerCase()} side)
          </H>
          <div className="mt-3 grid gap-6 md:grid-cols-2 print:grid-cols-2">
            <div className="flex flex-col gap-3">
              <Sub className="text-lg">Where the electrodes go</Sub>
              <BodyOutline readOnly channels={[{ id: channel.id, label: `Channel ${index + 1}`, index, markers: channel.markers }]} activeChannelId={channel.id} />
              {channel.placementNote ? <p>{channel.placementNote}</p> : null}
              {channel.photoIds.length > 0 ? (
                <ul className="flex flex-wrap gap-3">
                  {channel.photoIds.map((id, photoIndex) => (
                    <li key={id}>
                      {/* eslint-disable-next-line @next/next/no-img-element -- private, authorised images */}
                      <img src={photoUrl(id)} alt={`Channel ${index + 1}, placement photo ${photoIndex + 1}`} className="max-h-56 rounded border border-line" />
                    </li>
                  ))}
                </ul>
              ) : null}
            </div>
            <div className="flex flex-col gap-3">
              <Sub className="text-lg">Stimulator settings</Sub>
              <table className="w-full text-left tabular-nums">
                <caption className="sr-only">Channel {index + 1} settings</caption>
                <tbody>
                  {settingsRows(channel).map(([label, value]) => (
                    <tr key={label} className="border-b border-line-soft align-top">
                      <th scope="row" className="py-1 pr-3 font-bold">
                        {label}
                      </th>
                      <td className="py-1">{value}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
              <CycleRibbon {...channel.settings} title={`Channel ${index + 1}: one cycle of on and rest`} table="sr-only" />
            </div>
          </div>
        </section>
      ))}
      <section className="break-inside-avoid-page">
        <H className="text-2xl">Before each session: skin preparation</H>
        <ol className="mt-2 list-decimal pl-6">
          {content.skinPreparation.map((step) => (
            <li key={step}>{step}</li>
          ))}
        </ol>
      </section>
      <section className="break-inside-avoid-page">
        <H className="text-2xl">After each session: electrode care</H>
        <ol className="mt-2 list-decimal pl-6">
          {content.electrodeCare.map((step) => (
            <li key={step}>{step}</li>
          ))}
        </ol>
      </section>
      <section className="break-inside-avoid-page rounded-md border-l-4 border-warning bg-warning-bg p-4">
        <H className="flex items-center gap-2 text-2xl">
          <span aria-hidden>▲</span> Cautions
        </H>
        <ul className="mt-2 list-disc pl-6">
          {[...content.standardCautions, ...content.ownCautions].map((caution) => (
            <li key={caution}>{caution}</li>
          ))}
        </ul>
      </section>
    </div>
  );
}
