import { StimPicture } from "@/components/stim-picture";
import type { ChannelReport } from "@/lib/programmes/analyse";

// The live picture beside a channel: the same computation the server runs when the programme is published.
export function ChannelReportPanel({ number, report }: { number: number; report: ChannelReport | undefined }) {
  return (
    <div className="flex flex-col gap-3">
      <h3 className="text-xl">What channel {number}&apos;s settings give</h3>
      {report ? <StimPicture analysis={report.analysis} /> : <p className="text-ink-soft">Enter the settings to see the figures.</p>}
    </div>
  );
}
