import { VIEWS, type View } from "@/lib/placement";
import { VIEW_WORDS, letterOf, whereText } from "./marker-text";
import type { OutlineChannel } from "./types";

const ORIENTATION: Record<View, string> = {
  front: "Front view, the client facing you: their left side is on your right.",
  back: "Back view, the client seen from behind: their left side is on your left.",
};

/** A full-sentence description of one view's drawing, for its <desc>. */
export function describeView(view: View, channels: readonly OutlineChannel[]): string {
  const parts = channels.map((channel) => {
    const electrodes = channel.markers.map((marker, i) => {
      const letter = letterOf(i as 0 | 1);
      if (!marker) return `electrode ${letter} not placed yet`;
      if (marker.view !== view) return `electrode ${letter} on the ${VIEW_WORDS[marker.view]}`;
      return `electrode ${letter} on ${whereText(marker)}`;
    });
    return `${channel.label}: ${electrodes.join("; ")}.`;
  });
  return [ORIENTATION[view], ...parts].join(" ");
}

/** The views that hold at least one marker, in order; the front view when there are none. */
export function viewsWithMarkers(channels: readonly OutlineChannel[]): View[] {
  const used = VIEWS.filter((view) => channels.some((c) => c.markers.some((m) => m?.view === view)));
  return used.length > 0 ? used : ["front"];
}
