import { ELECTRODE_LETTERS, markerZone, type ElectrodeIndex, type Marker, type View } from "@/lib/placement";
import { positionPercent } from "./marker-geometry";

export const VIEW_NAMES: Record<View, string> = {
  front: "Front (client facing you)",
  back: "Back (seen from behind)",
};

export const VIEW_TITLES: Record<View, string> = { front: "Front", back: "Back" };
export const VIEW_HINTS: Record<View, string> = { front: "client facing you", back: "seen from behind" };

export const VIEW_WORDS: Record<View, string> = { front: "front view", back: "back view" };

export const OFF_BODY = "off the body outline";
export const NOT_PLACED = "not placed yet";

export const letterOf = (index: ElectrodeIndex) => ELECTRODE_LETTERS[index];

/** Where a marker is, in words: its zone's label, off the body, or not placed. */
export function whereText(marker: Marker | null): string {
  if (!marker) return NOT_PLACED;
  return markerZone(marker)?.label ?? OFF_BODY;
}

/** "Channel 1, electrode A, on Left forearm, back of the arm (wrist and finger extensors)". */
export function markerName(channelLabel: string, index: ElectrodeIndex, marker: Marker): string {
  const zone = markerZone(marker);
  return `${channelLabel}, electrode ${letterOf(index)}, ${zone ? `on ${zone.label}` : OFF_BODY}`;
}

/** The marker's spoken value while it moves: its place on the drawing, in per cent. */
export function markerValueText(marker: Marker): string {
  const { across, down } = positionPercent(marker);
  return `${across}% across, ${down}% down the ${VIEW_WORDS[marker.view]}`;
}

/** What the live region says when a marker arrives somewhere new. */
export function movedText(channelLabel: string, index: ElectrodeIndex, marker: Marker): string {
  return `${channelLabel}, electrode ${letterOf(index)}: ${whereText(marker)}.`;
}
