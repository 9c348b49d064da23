import { AdherenceInputError } from "@/lib/adherence";
import { amplitudeChartData, amplitudeRows, ceilingSteps, type AmplitudePoint, type AmplitudeRow, type CeilingStep } from "./amplitude";
import { adherenceRows, type AdherenceRow } from "./adherence";
import { channelsAcross, type ChannelSeries } from "./channels";
import { sessionRows, type SessionRow } from "./sessions";
import { adherenceSummary, amplitudeSummary, comfortSummary, skinSummary } from "./summaries";
import { dayTicks, placeCheckIns, timeDomain } from "./timeline";
import type { TrendCheckIn, TrendVersion } from "./types";
import { versionMarkers, type VersionMarker } from "./versions";

export type TimeAxis = { domain: [number, number]; ticks: number[] };

export type Trends = {
  axis: TimeAxis;
  markers: VersionMarker[];
  channels: ChannelSeries[];
  amplitude: { rows: AmplitudeRow[]; chartData: AmplitudePoint[]; ceilings: CeilingStep[][]; summary: string };
  sessions: { rows: SessionRow[]; comfortSummary: string; skinSummary: string };
  adherence: { rows: AdherenceRow[]; summary: string };
};

// lib/adherence refuses input it cannot read unambiguously (a later version dated before an earlier one); the
// other charts do not depend on it, so only this one gives way, saying why.
function adherenceOrProblem(versions: TrendVersion[], checkIns: TrendCheckIn[], today: string, completeFrom?: string): Trends["adherence"] {
  try {
    const rows = adherenceRows(versions, checkIns, today, completeFrom);
    return { rows, summary: adherenceSummary(rows) };
  } catch (error) {
    if (!(error instanceof AdherenceInputError)) throw error;
    return { rows: [], summary: `Adherence cannot be worked out: ${error.message}` };
  }
}

/**
 * Everything the trends page draws, from the versions and check-ins of one client. Null when there is nothing to
 * draw: no check-ins yet. `completeFrom` is the first day for which every check-in was loaded, when not all were.
 */
export function buildTrends(input: { versions: TrendVersion[]; checkIns: TrendCheckIn[]; today: string; completeFrom?: string }): Trends | null {
  const { versions, checkIns, today, completeFrom } = input;
  if (checkIns.length === 0) return null;
  const placed = placeCheckIns(checkIns);
  // The axis runs to today, so weeks without a session show as the silence they are.
  const domain = timeDomain([...versions.map((v) => v.publishedOn), ...checkIns.map((c) => c.sessionDate), today]);
  const channels = channelsAcross(versions);
  const amplitude = amplitudeRows(placed, channels, versions);
  const sessions = sessionRows(placed, channels);
  const adherence = adherenceOrProblem(versions, checkIns, today, completeFrom);
  return {
    axis: { domain, ticks: dayTicks(domain) },
    markers: versionMarkers(versions),
    channels,
    amplitude: {
      rows: amplitude,
      chartData: amplitudeChartData(amplitude, channels),
      ceilings: channels.map((channel) => ceilingSteps(channel, versions, domain[1])),
      summary: amplitudeSummary(amplitude, channels),
    },
    sessions: { rows: sessions, comfortSummary: comfortSummary(sessions), skinSummary: skinSummary(sessions) },
    adherence,
  };
}

export { dayNumber, dayOfNumber, londonDay } from "./days";
export { formatCount, formatDay, formatMa, formatPercent, formatShortDay, formatTick, loggedByText, versionLabel } from "./format";
export { toTrendCheckIn, toTrendVersion } from "./inputs";
export { skinLevelWords, worstSkin } from "./skin";
export type { AdherenceRow, AmplitudePoint, AmplitudeRow, CeilingStep, ChannelSeries, SessionRow, VersionMarker };
export type { LoggedBy, TrendCheckIn, TrendVersion } from "./types";
