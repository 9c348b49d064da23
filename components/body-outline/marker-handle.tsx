import type { KeyboardEvent, PointerEvent, Ref } from "react";
import type { ElectrodeIndex, Marker } from "@/lib/placement";
import type { MarkerShape } from "./channel-style";
import { MarkerGlyph } from "./marker-glyph";
import { HIT_RADIUS, MARKER_RADIUS, positionPercent } from "./marker-geometry";
import { markerName, markerValueText } from "./marker-text";

export interface MarkerHandleEvents {
  onKeyDown: (electrode: ElectrodeIndex, event: KeyboardEvent<SVGGElement>) => void;
  onPointerDown: (electrode: ElectrodeIndex, event: PointerEvent<SVGGElement>) => void;
  onPointerMove: (event: PointerEvent<SVGGElement>) => void;
  onPointerUp: (event: PointerEvent<SVGGElement>) => void;
  onPointerCancel: () => void;
  onFocusChange: (electrode: ElectrodeIndex | null) => void;
  onClick: () => void;
}

/**
 * One electrode of the channel being edited, as a focusable control. It is a slider in ARIA terms so screen
 * readers pass the arrow keys through to it; the value it speaks is its place on the drawing, and its name
 * carries the zone. Sliders need a number: `aria-valuenow` is how far down the drawing it sits, in per cent.
 */
export function MarkerHandle({ electrode, marker, channelLabel, shape, tag, hintId, handleRef, events, dragging }: {
  electrode: ElectrodeIndex;
  marker: Marker;
  channelLabel: string;
  shape: MarkerShape;
  tag: string;
  hintId: string;
  handleRef: Ref<SVGGElement>;
  events: MarkerHandleEvents;
  dragging: boolean;
}) {
  return (
    <g
      ref={handleRef}
      role="slider"
      tabIndex={0}
      data-marker=""
      aria-roledescription="electrode marker"
      aria-label={markerName(channelLabel, electrode, marker)}
      aria-valuemin={0}
      aria-valuemax={100}
      aria-valuenow={positionPercent(marker).down}
      aria-valuetext={markerValueText(marker)}
      aria-describedby={hintId}
      className={`group touch-none outline-none ${dragging ? "cursor-grabbing" : "cursor-grab"}`}
      onKeyDown={(event) => events.onKeyDown(electrode, event)}
      onPointerDown={(event) => events.onPointerDown(electrode, event)}
      onPointerMove={events.onPointerMove}
      onPointerUp={events.onPointerUp}
      onPointerCancel={events.onPointerCancel}
      onFocus={() => events.onFocusChange(electrode)}
      onBlur={() => events.onFocusChange(null)}
      onClick={(event) => {
        // A click that ends a drag must not also place a new marker where the drag ended.
        event.stopPropagation();
        events.onClick();
      }}
    >
      <circle cx={marker.x} cy={marker.y} r={HIT_RADIUS} className="fill-transparent" />
      <circle
        cx={marker.x}
        cy={marker.y}
        r={MARKER_RADIUS + 6}
        className="hidden fill-none stroke-focus group-focus-visible:inline"
        strokeWidth={3}
      />
      <MarkerGlyph x={marker.x} y={marker.y} shape={shape} tag={tag} />
    </g>
  );
}
