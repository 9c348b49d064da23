import type { ReactNode } from "react";
import type { ElectrodeIndex } from "@/lib/placement";
import { channelIndex, channelStyle, markerTag } from "./channel-style";
import { MarkerGlyph } from "./marker-glyph";
import { VIEW_WORDS, letterOf, whereText } from "./marker-text";
import type { OutlineChannel } from "./types";

const ELECTRODES: readonly ElectrodeIndex[] = [0, 1];

/**
 * The drawing in words: each channel's electrodes and the zone each one is on, with the marker as drawn beside
 * it. The editor adds its controls to the channel being edited through `controls`.
 */
export function MarkerList({ channels, activeChannelId, controls }: { channels: readonly OutlineChannel[]; activeChannelId?: string; controls?: (channel: OutlineChannel, electrode: ElectrodeIndex) => ReactNode }) {
  return (
    <ul className="flex flex-col gap-4" aria-label="Electrode positions in words">
      {channels.map((channel, position) => {
        const index = channelIndex(channel, position);
        const style = channelStyle(index);
        const editing = controls !== undefined && channel.id === activeChannelId;
        return (
          <li key={channel.id} className="flex flex-col gap-2">
            <p className="font-bold">
              {channel.label}
              {editing ? <span className="font-normal text-ink-soft"> (being edited)</span> : null}
            </p>
            <ul className="flex flex-col gap-2">
              {ELECTRODES.map((electrode) => {
                const marker = channel.markers[electrode];
                const letter = letterOf(electrode);
                return (
                  <li key={electrode} className="flex flex-col gap-2">
                    <p className="flex items-start gap-2">
                      <svg viewBox="-16 -16 32 32" className="size-8 shrink-0" aria-hidden="true">
                        <MarkerGlyph x={0} y={0} shape={style.shape} tag={markerTag(index, letter)} />
                      </svg>
                      <span>
                        <span className="font-bold">Electrode {letter}:</span> {whereText(marker)}
                        {marker ? <span className="text-ink-soft"> ({VIEW_WORDS[marker.view]})</span> : null}
                      </span>
                    </p>
                    {editing ? controls(channel, electrode) : null}
                  </li>
                );
              })}
            </ul>
          </li>
        );
      })}
    </ul>
  );
}
