import { bodyRegionForMarkers, placementFindings } from "@/lib/placement";
import { analyseChannel, sortFindings, type ChannelAnalysis, type Finding } from "@/lib/stim";
import type { MarkerValue } from "./content";

// Each channel analysed as a whole: its stimulation settings with the programme's schedule, and where its two
// electrodes sit on the body. Runs in the builder on every change and again on the server when publishing.

type ChannelInput = { id?: unknown; settings?: unknown; markers?: unknown };
type ContentInput = { channels?: ChannelInput[]; schedule?: Record<string, unknown> };

export type PlacementFinding = ReturnType<typeof placementFindings>[number];

export type ChannelReport = {
  number: number;
  id: string;
  analysis: ChannelAnalysis;
  placement: PlacementFinding[];
  blocking: { title: string }[];
};

function markersOf(channel: ChannelInput): [MarkerValue | null, MarkerValue | null] {
  const markers = Array.isArray(channel.markers) ? channel.markers : [];
  return [(markers[0] as MarkerValue | undefined) ?? null, (markers[1] as MarkerValue | undefined) ?? null];
}

export function analyseProgramme(content: ContentInput, options: { earlyProgramme?: boolean } = {}): ChannelReport[] {
  const schedule = content.schedule ?? {};
  return (content.channels ?? []).map((channel, index) => {
    const markers = markersOf(channel);
    const analysis = analyseChannel({
      ...(channel.settings as object),
      sessionMinutes: schedule.minutesPerSession,
      sessionsPerDay: schedule.sessionsPerDay,
      daysPerWeek: schedule.daysPerWeek,
      bodyRegion: bodyRegionForMarkers(markers),
      earlyProgramme: options.earlyProgramme ?? true,
    });
    // Schedule fields are checked once for the programme, not once per channel.
    const findings = analysis.findings.filter((finding) => !isScheduleField(finding));
    const placement = placementFindings(markers);
    const blocking = [...findings, ...placement].filter((finding) => finding.severity === "blocks");
    return {
      number: index + 1,
      id: typeof channel.id === "string" ? channel.id : `ch-${index + 1}`,
      analysis: { ...analysis, findings: sortFindings(findings) },
      placement,
      blocking,
    };
  });
}

function isScheduleField(finding: Finding): boolean {
  return finding.field === "sessionMinutes" || finding.field === "sessionsPerDay" || finding.field === "daysPerWeek";
}
