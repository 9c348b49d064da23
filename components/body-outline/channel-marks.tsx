import type { ElectrodeIndex, View } from "@/lib/placement";
import { ChannelLine } from "./channel-line";
import { channelIndex, channelStyle, markerTag } from "./channel-style";
import { MarkerGlyph } from "./marker-glyph";
import { letterOf } from "./marker-text";
import type { OutlineChannel } from "./types";

/**
 * Every channel's markers in one view, without interaction: the line first, then the markers on top. With an
 * `activeChannelId` the other channels are drawn muted; `skipChannelId` leaves one out (the editor draws it).
 */
export function ChannelMarks({ view, channels, activeChannelId, skipChannelId }: { view: View; channels: readonly OutlineChannel[]; activeChannelId?: string; skipChannelId?: string }) {
  return (
    <g aria-hidden="true" className="pointer-events-none">
      {channels.map((channel, position) => {
        if (channel.id === skipChannelId) return null;
        const index = channelIndex(channel, position);
        const style = channelStyle(index);
        const muted = activeChannelId !== undefined && channel.id !== activeChannelId;
        return (
          <g key={channel.id}>
            <ChannelLine view={view} markers={channel.markers} style={style} muted={muted} />
            {channel.markers.map((marker, i) =>
              marker && marker.view === view ? (
                <MarkerGlyph key={i} x={marker.x} y={marker.y} shape={style.shape} tag={markerTag(index, letterOf(i as ElectrodeIndex))} muted={muted} />
              ) : null,
            )}
          </g>
        );
      })}
    </g>
  );
}
