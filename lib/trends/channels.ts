import { sortVersions } from "./versions";
import type { TrendVersion } from "./types";

export type ChannelSeries = {
  id: string;
  /** "Channel 1", or "Channel 3 (last in v2)" for a channel the programme no longer has. */
  shortLabel: string;
  /** "Channel 1: Wrist and finger flexors". */
  label: string;
  /** Position in the list: picks the line pattern and marker, and names the chart's data key. */
  index: number;
  key: string;
};

// Every channel any version had: the latest version's channels in its order, then channels dropped earlier, the
// most recently dropped first. A channel keeps its id across versions, so it keeps one line. Channels are numbered
// as in the latest version that has them; a dropped one also names that version, so no two share a name (a
// version's positions are unique).
export function channelsAcross(versions: TrendVersion[]): ChannelSeries[] {
  const newestFirst = sortVersions(versions).reverse();
  const latest = newestFirst[0];
  const found: ChannelSeries[] = [];
  for (const version of newestFirst) {
    version.channels.forEach((channel, position) => {
      if (found.some((f) => f.id === channel.id)) return;
      const shortLabel = `Channel ${position + 1}${version === latest ? "" : ` (last in v${version.number})`}`;
      const index = found.length;
      found.push({ id: channel.id, shortLabel, label: `${shortLabel}: ${channel.target}`, index, key: `channel${index}` });
    });
  }
  return found;
}
