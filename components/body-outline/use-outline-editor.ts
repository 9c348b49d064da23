import { useEffect, useRef, useState, type KeyboardEvent, type MouseEvent, type PointerEvent } from "react";
import { markerInZone, markerZone, type ElectrodeIndex, type Marker, type View } from "@/lib/placement";
import { clampToView, clientToViewBox, stepMarker } from "./marker-geometry";
import type { MarkerHandleEvents } from "./marker-handle";
import { letterOf, movedText } from "./marker-text";
import type { MarkerTuple, OutlineChannel } from "./types";

type Drag = { electrode: ElectrodeIndex; pointerId: number; marker: Marker; moved: boolean };

const withMarker = (markers: MarkerTuple, electrode: ElectrodeIndex, marker: Marker | null): MarkerTuple =>
  electrode === 0 ? [marker, markers[1]] : [markers[0], marker];

const sameZone = (a: Marker | null, b: Marker | null) => (a ? markerZone(a)?.id : undefined) === (b ? markerZone(b)?.id : undefined);

/** State and actions of the interactive outline: the view shown, a drag in progress, and what to announce. */
export function useOutlineEditor(channels: readonly OutlineChannel[], activeChannelId: string, onChange: (channelId: string, markers: MarkerTuple) => void) {
  const active = channels.find((c) => c.id === activeChannelId) ?? null;
  const label = active?.label ?? "";
  const committed: MarkerTuple = active ? [active.markers[0], active.markers[1]] : [null, null];
  const [view, setView] = useState<View>(() => committed.find((m) => m !== null)?.view ?? "front");
  const [drag, setDrag] = useState<Drag | null>(null);
  const [focused, setFocused] = useState<ElectrodeIndex | null>(null);
  const [message, setMessage] = useState("");
  // A newly chosen channel opens on the view that holds its markers (state adjusted while rendering, not in an effect).
  const [shownFor, setShownFor] = useState(activeChannelId);
  if (shownFor !== activeChannelId) {
    setShownFor(activeChannelId);
    setDrag(null);
    const first = committed.find((m) => m !== null);
    if (first) setView(first.view);
  }
  const svgRef = useRef<SVGSVGElement>(null);
  const panelRef = useRef<HTMLDivElement>(null);
  const handleRefs = useRef<(SVGGElement | null)[]>([null, null]);
  const pendingFocus = useRef<ElectrodeIndex | null>(null);
  const justDragged = useRef(false);

  // After "place on this zone" the new marker takes the focus, once the view that holds it has been drawn.
  useEffect(() => {
    const electrode = pendingFocus.current;
    if (electrode === null) return;
    const handle = handleRefs.current[electrode];
    if (handle) {
      handle.focus();
      pendingFocus.current = null;
    }
  });

  // Touch: CSS touch-action does not reach elements inside an SVG, so a finger on a marker would scroll the page
  // and cancel the drag. A touch that starts on a marker is kept from scrolling; elsewhere the page scrolls as usual.
  useEffect(() => {
    const svg = svgRef.current;
    if (!svg) return;
    const keep = (event: TouchEvent) => {
      if (event.target instanceof Element && event.target.closest("[data-marker]")) event.preventDefault();
    };
    svg.addEventListener("touchstart", keep, { passive: false });
    return () => svg.removeEventListener("touchstart", keep);
  }, []);

  // Saying the same words twice must still be heard, so a repeat differs by an invisible space.
  const announce = (text: string) => setMessage((previous) => (previous === text ? `${text}\u00a0` : text));
  const commit = (next: MarkerTuple) => {
    if (active) onChange(active.id, next);
  };
  const shown: MarkerTuple = drag ? withMarker(committed, drag.electrode, drag.marker) : committed;

  const move = (electrode: ElectrodeIndex, marker: Marker) => {
    commit(withMarker(committed, electrode, marker));
    if (!sameZone(committed[electrode], marker)) announce(movedText(label, electrode, marker));
  };
  const remove = (electrode: ElectrodeIndex) => {
    commit(withMarker(committed, electrode, null));
    announce(`${label}, electrode ${letterOf(electrode)} removed.`);
    panelRef.current?.focus();
  };
  const placeInZone = (electrode: ElectrodeIndex, zoneId: string) => {
    const marker = markerInZone(zoneId);
    commit(withMarker(committed, electrode, marker));
    setView(marker.view);
    pendingFocus.current = electrode;
    announce(movedText(label, electrode, marker));
  };
  const toViewBox = (clientX: number, clientY: number) => {
    const rect = svgRef.current?.getBoundingClientRect();
    const point = rect ? clientToViewBox(clientX, clientY, rect) : null;
    return point ? clampToView(Math.round(point.x), Math.round(point.y)) : null;
  };

  const onSvgClick = (event: MouseEvent<SVGSVGElement>) => {
    if (justDragged.current || !active) {
      justDragged.current = false;
      return;
    }
    const point = toViewBox(event.clientX, event.clientY);
    if (!point) return;
    const marker: Marker = { view, ...point };
    const zone = markerZone(marker);
    if (!zone) return announce("That point is off the body outline: click or tap on the body.");
    const electrode = committed[0] === null ? 0 : committed[1] === null ? 1 : null;
    if (electrode === null) return announce(`Both electrodes of ${label} are placed: drag one to move it, or remove one first.`);
    commit(withMarker(committed, electrode, marker));
    announce(`${label}, electrode ${letterOf(electrode)} placed: ${zone.label}.`);
  };

  const events: MarkerHandleEvents = {
    onKeyDown: (electrode: ElectrodeIndex, event: KeyboardEvent<SVGGElement>) => {
      const marker = committed[electrode];
      if (!marker) return;
      if (event.key === "Escape" && drag) {
        setDrag(null);
        return announce(`${label}, electrode ${letterOf(electrode)}: move cancelled.`);
      }
      if (event.key === "Delete" || event.key === "Backspace") {
        event.preventDefault();
        return remove(electrode);
      }
      const next = stepMarker(marker, event.key, event.shiftKey);
      if (!next) return;
      event.preventDefault();
      move(electrode, next);
    },
    onPointerDown: (electrode: ElectrodeIndex, event: PointerEvent<SVGGElement>) => {
      const marker = committed[electrode];
      if (!marker || event.button !== 0) return;
      event.currentTarget.setPointerCapture(event.pointerId);
      setDrag({ electrode, pointerId: event.pointerId, marker, moved: false });
    },
    onPointerMove: (event: PointerEvent<SVGGElement>) => {
      if (!drag || drag.pointerId !== event.pointerId) return;
      const point = toViewBox(event.clientX, event.clientY);
      if (!point || (point.x === drag.marker.x && point.y === drag.marker.y)) return;
      const marker: Marker = { view: drag.marker.view, ...point };
      if (!sameZone(drag.marker, marker)) announce(movedText(label, drag.electrode, marker));
      setDrag({ ...drag, marker, moved: true });
    },
    onPointerUp: (event: PointerEvent<SVGGElement>) => {
      if (!drag || drag.pointerId !== event.pointerId) return;
      if (drag.moved) {
        justDragged.current = true;
        commit(withMarker(committed, drag.electrode, drag.marker));
      }
      setDrag(null);
    },
    onPointerCancel: () => setDrag(null),
    onFocusChange: setFocused,
    onClick: () => {
      justDragged.current = false;
    },
  };

  const highlighted = drag ? drag.marker : focused !== null ? shown[focused] : null;
  return {
    active, label, view, setView, shown, drag, message, svgRef, panelRef, handleRefs, events, onSvgClick, placeInZone, remove,
    highlightZoneId: highlighted ? (markerZone(highlighted)?.id ?? null) : null,
  };
}
