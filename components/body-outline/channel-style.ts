import type { OutlineChannel } from "./types";

export type MarkerShape = "circle" | "square" | "diamond" | "hexagon";

export interface ChannelStyle {
  shape: MarkerShape;
  /** SVG dash pattern of the line between the channel's two markers; undefined for a solid line. */
  dash?: string;
}

// Channels differ by marker shape and line pattern as well as by the number on each marker, never by colour:
// the palette's signal colours are kept for severities.
export const CHANNEL_STYLES: readonly ChannelStyle[] = [
  { shape: "circle" },
  { shape: "square", dash: "9 6" },
  { shape: "diamond", dash: "2 6" },
  { shape: "hexagon", dash: "12 5 2 5" },
];

export const channelIndex = (channel: OutlineChannel, position: number) => channel.index ?? position;

export const channelStyle = (index: number): ChannelStyle => CHANNEL_STYLES[index % CHANNEL_STYLES.length]!;

/** What is written on a marker: channel number and electrode letter, e.g. "1A". */
export const markerTag = (index: number, letter: string) => `${index + 1}${letter}`;
