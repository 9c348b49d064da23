import { VIEW_BOX, zonesForView, type Point, type View } from "@/lib/placement";
import { OutlineDetails } from "./outline-details";

export const toPoints = (points: readonly Point[]) => points.map(([x, y]) => `${x},${y}`).join(" ");

const SIDE_LABELS: Record<View, [viewerLeft: string, viewerRight: string]> = {
  front: ["Client's right", "Client's left"],
  back: ["Client's left", "Client's right"],
};

/**
 * The outline of one view: the zones drawn as one calm silhouette, their names as tooltips, a few landmarks and
 * which side is which. `interactive` lets a zone show itself under the pointer; `highlightZoneId` shows one zone
 * (the zone of the focused marker).
 */
export function OutlineBody({ view, interactive = false, highlightZoneId }: { view: View; interactive?: boolean; highlightZoneId?: string | null }) {
  const zones = zonesForView(view);
  const [left, right] = SIDE_LABELS[view];
  return (
    <>
      {/* The silhouette: a thick ink stroke round every zone, then every zone filled over it, so only the outer
          half of the stroke (the body's edge) remains and the zones read as one body. */}
      <g aria-hidden="true" className="fill-none stroke-ink" strokeWidth={4.5} strokeLinejoin="round">
        {zones.map((zone) => (
          <polygon key={zone.id} points={toPoints(zone.points)} />
        ))}
      </g>
      <g aria-hidden="true" className="fill-card stroke-card" strokeWidth={1} strokeLinejoin="round">
        {zones.map((zone) => (
          <polygon key={zone.id} points={toPoints(zone.points)} />
        ))}
      </g>
      <g aria-hidden="true" strokeWidth={1.5} strokeLinejoin="round">
        {zones.map((zone) => (
          <polygon
            key={zone.id}
            points={toPoints(zone.points)}
            data-zone={zone.id}
            className={
              zone.id === highlightZoneId
                ? "fill-line-soft stroke-line"
                : interactive
                  ? "fill-transparent stroke-transparent hover:fill-line-soft hover:stroke-line"
                  : "fill-transparent stroke-transparent"
            }
          >
            <title>{zone.label}</title>
          </polygon>
        ))}
      </g>
      <OutlineDetails view={view} />
      <g aria-hidden="true" className="pointer-events-none fill-ink-soft" fontSize={15} fontWeight={700}>
        <text x={12} y={28}>{left}</text>
        <text x={VIEW_BOX.width - 12} y={28} textAnchor="end">{right}</text>
      </g>
    </>
  );
}
