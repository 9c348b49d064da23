"use client";
import { useId, useState } from "react";
import { VIEW_BOX, placementFindings, zoneAt, type ElectrodeIndex, type View } from "@/lib/placement";
import { ChannelMarks } from "./channel-marks";
import { ChannelLine } from "./channel-line";
import { channelIndex, channelStyle, markerTag } from "./channel-style";
import { clientToViewBox } from "./marker-geometry";
import { MarkerHandle } from "./marker-handle";
import { MarkerList } from "./marker-list";
import { VIEW_NAMES, letterOf } from "./marker-text";
import { OutlineBody } from "./outline-body";
import { PlaceControls } from "./place-controls";
import { PlacementNotices } from "./placement-notices";
import type { MarkerTuple, OutlineChannel } from "./types";
import { useOutlineEditor } from "./use-outline-editor";
import { ViewTabs, tabId } from "./view-tabs";

export interface BodyOutlineEditorProps {
  channels: readonly OutlineChannel[];
  activeChannelId: string;
  onChange: (channelId: string, markers: MarkerTuple) => void;
}

const ELECTRODES: readonly ElectrodeIndex[] = [0, 1];

/** The interactive outline: place, drag and step the active channel's two markers; see NOTES.md. */
export function BodyOutlineEditor({ channels, activeChannelId, onChange }: BodyOutlineEditorProps) {
  const id = useId();
  const ids = { panel: `${id}-panel`, hint: `${id}-hint`, words: `${id}-words`, checks: `${id}-checks` };
  const { active, label, view, setView, shown, drag, message, svgRef, panelRef, handleRefs, events, onSvgClick, placeInZone, remove, highlightZoneId } =
    useOutlineEditor(channels, activeChannelId, onChange);
  const [pointing, setPointing] = useState<string | null>(null);
  const position = active ? channels.indexOf(active) : -1;
  const index = active ? channelIndex(active, position) : 0;
  const style = channelStyle(index);
  const tags: Record<View, string[]> = { front: [], back: [] };
  ELECTRODES.forEach((electrode) => {
    const marker = shown[electrode];
    if (marker) tags[marker.view].push(markerTag(index, letterOf(electrode)));
  });
  const showPointing = (clientX: number, clientY: number, target: SVGSVGElement) => {
    const point = clientToViewBox(clientX, clientY, target.getBoundingClientRect());
    setPointing(point ? (zoneAt(view, point.x, point.y)?.label ?? null) : null);
  };

  return (
    <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,520px)_minmax(0,1fr)]">
      <div className="flex min-w-0 flex-col gap-3">
        <ViewTabs view={view} onSelect={setView} idBase={id} panelId={ids.panel} tags={tags} />
        <div ref={panelRef} role="tabpanel" id={ids.panel} aria-labelledby={tabId(id, view)} tabIndex={-1} className="rounded-md border-2 border-line bg-paper p-2">
          <svg
            ref={svgRef}
            viewBox={`0 0 ${VIEW_BOX.width} ${VIEW_BOX.height}`}
            role="group"
            aria-label={`Body outline, ${VIEW_NAMES[view].toLowerCase()}`}
            aria-describedby={ids.hint}
            className="h-auto w-full cursor-crosshair select-none"
            onClick={onSvgClick}
            onPointerMove={(event) => showPointing(event.clientX, event.clientY, event.currentTarget)}
            onPointerLeave={() => setPointing(null)}
          >
            <OutlineBody view={view} interactive highlightZoneId={highlightZoneId} />
            <ChannelMarks view={view} channels={channels} activeChannelId={activeChannelId} skipChannelId={activeChannelId} />
            {active ? (
              <g>
                <ChannelLine view={view} markers={shown} style={style} />
                {ELECTRODES.map((electrode) => {
                  const marker = shown[electrode];
                  if (!marker || marker.view !== view) return null;
                  return (
                    <MarkerHandle
                      key={electrode}
                      electrode={electrode}
                      marker={marker}
                      channelLabel={label}
                      shape={style.shape}
                      tag={markerTag(index, letterOf(electrode))}
                      hintId={ids.hint}
                      handleRef={(el) => {
                        handleRefs.current[electrode] = el;
                      }}
                      events={events}
                      dragging={drag?.electrode === electrode}
                    />
                  );
                })}
              </g>
            ) : null}
          </svg>
          <p aria-hidden="true" className="min-h-6 px-1 text-sm text-ink-soft">
            {pointing ? `Under the pointer: ${pointing}` : " "}
          </p>
        </div>
        <p id={ids.hint} className="text-sm text-ink-soft">
          {active
            ? `Click or tap the outline to place the next electrode of ${label}; drag a marker to move it. With the keyboard, tab to a marker, move it with the arrow keys (Shift with an arrow moves it further) and remove it with Delete, or choose a part of the body in the list.`
            : "Choose a channel to place its electrodes."}
        </p>
        <p aria-live="polite" className="sr-only">
          {message}
        </p>
      </div>
      <div className="flex min-w-0 flex-col gap-6">
        <section aria-labelledby={ids.words} className="flex flex-col gap-2">
          <h3 id={ids.words} className="text-xl">Electrodes in words</h3>
          <MarkerList
            channels={channels}
            activeChannelId={activeChannelId}
            controls={(channel, electrode) => (
              <PlaceControls
                key={`${channel.id}-${electrode}`}
                electrode={electrode}
                marker={channel.markers[electrode]}
                onPlace={(zoneId) => placeInZone(electrode, zoneId)}
                onRemove={() => remove(electrode)}
              />
            )}
          />
        </section>
        {active ? (
          <section aria-labelledby={ids.checks} className="flex flex-col gap-2">
            <h3 id={ids.checks} className="text-xl">Placement checks</h3>
            <PlacementNotices channelLabel={label} findings={placementFindings(active.markers)} />
          </section>
        ) : null}
      </div>
    </div>
  );
}
