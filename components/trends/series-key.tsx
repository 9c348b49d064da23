import type { MarkerShape } from "@/components/body-outline/channel-style";
import { ShapeMark } from "./series-shapes";

export type KeyItem = { label: string; dash?: string; shape?: MarkerShape; thin?: boolean; upright?: boolean; ringed?: boolean; bar?: "solid" | "hatched" };

// The chart's key in HTML, so it wraps on a phone and reads as a list; each sample draws the line pattern and
// marker of its series, since no series is told apart by colour.
export function SeriesKey({ items, label }: { items: KeyItem[]; label: string }) {
  return (
    <ul aria-label={label} className="flex flex-wrap gap-x-6 gap-y-2 text-sm">
      {items.map((item) => (
        <li key={item.label} className="flex items-center gap-2">
          <svg width="44" height="20" viewBox="0 0 44 20" aria-hidden className="shrink-0">
            {item.bar ? (
              <>
                <rect x="14" y="3" width="16" height="15" className={item.bar === "solid" ? "fill-ink stroke-ink" : "fill-card stroke-ink"} strokeWidth="1.5" />
                {item.bar === "hatched" ? [18, 23, 28].map((x) => <line key={x} x1={x - 4} y1="17" x2={x + 2} y2="4" className="stroke-ink" strokeWidth="2" />) : null}
              </>
            ) : item.upright ? (
              <line x1="22" y1="1" x2="22" y2="19" className="stroke-ink-soft" strokeWidth="1.5" strokeDasharray={item.dash} />
            ) : (
              <line x1="2" y1="10" x2="42" y2="10" className={item.thin ? "stroke-ink-soft" : "stroke-ink"} strokeWidth={item.thin ? 1.5 : 2.5} strokeDasharray={item.dash} />
            )}
            {item.shape ? <ShapeMark shape={item.shape} cx={22} cy={10} filled={item.ringed} /> : null}
            {item.ringed ? <circle cx="22" cy="10" r="8" className="fill-none stroke-ink" strokeWidth="1.5" /> : null}
          </svg>
          <span>{item.label}</span>
        </li>
      ))}
    </ul>
  );
}

export const VERSION_LINE_DASH = "3 3";

export const versionKeyItem: KeyItem = { label: "Upright dotted line: a programme version (v1, v2 …) published that day", dash: VERSION_LINE_DASH, upright: true };
