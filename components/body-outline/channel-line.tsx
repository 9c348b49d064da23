import type { Marker, View } from "@/lib/placement";
import type { ChannelStyle } from "./channel-style";

/** The line between a channel's two markers, when both are in the view drawn; in the channel's line pattern. */
export function ChannelLine({ view, markers, style, muted = false }: { view: View; markers: readonly [Marker | null, Marker | null]; style: ChannelStyle; muted?: boolean }) {
  const [a, b] = markers;
  if (!a || !b || a.view !== view || b.view !== view) return null;
  return (
    <line
      aria-hidden="true"
      x1={a.x}
      y1={a.y}
      x2={b.x}
      y2={b.y}
      className={`pointer-events-none ${muted ? "stroke-ink-soft" : "stroke-ink"}`}
      strokeWidth={2.5}
      strokeDasharray={style.dash}
      strokeLinecap="round"
    />
  );
}
