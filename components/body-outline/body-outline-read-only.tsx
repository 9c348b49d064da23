// No "use client": the handout and the client's view render this on the server, with no browser APIs.
import { useId } from "react";
import { VIEW_BOX, type View } from "@/lib/placement";
import { ChannelMarks } from "./channel-marks";
import { describeView, viewsWithMarkers } from "./describe-view";
import { MarkerList } from "./marker-list";
import { VIEW_NAMES } from "./marker-text";
import { OutlineBody } from "./outline-body";
import type { OutlineChannel } from "./types";

export interface BodyOutlineReadOnlyProps {
  channels: readonly OutlineChannel[];
  /** When given, the other channels are drawn muted. */
  activeChannelId?: string;
  /** Which views to draw; by default those that hold a marker (the front view when none do). */
  views?: readonly View[];
}

export const READ_ONLY_NOTE =
  "Each mark shows roughly where the centre of an electrode goes. Follow your therapist's instructions and photos.";

function StaticView({ view, channels, activeChannelId }: { view: View; channels: readonly OutlineChannel[]; activeChannelId?: string }) {
  const id = useId();
  return (
    <figure className="flex flex-col gap-1">
      <svg
        viewBox={`0 0 ${VIEW_BOX.width} ${VIEW_BOX.height}`}
        className="h-auto w-full max-w-[480px]"
        role="img"
        aria-labelledby={`${id}-title`}
        aria-describedby={`${id}-desc`}
      >
        <title id={`${id}-title`}>{`Where the electrodes go: ${VIEW_NAMES[view].toLowerCase()}`}</title>
        <desc id={`${id}-desc`}>{describeView(view, channels)}</desc>
        <OutlineBody view={view} />
        <ChannelMarks view={view} channels={channels} activeChannelId={activeChannelId} />
      </svg>
      <figcaption className="text-sm font-bold text-ink-soft">{VIEW_NAMES[view]}</figcaption>
    </figure>
  );
}

/** The markers drawn without interaction (handout, client's view), each view with its description, then the list. */
export function BodyOutlineReadOnly({ channels, activeChannelId, views }: BodyOutlineReadOnlyProps) {
  const shown = views && views.length > 0 ? views : viewsWithMarkers(channels);
  return (
    <div className="flex flex-col gap-3">
      <div className={`grid gap-3 ${shown.length > 1 ? "grid-cols-2" : ""}`}>
        {shown.map((view) => (
          <StaticView key={view} view={view} channels={channels} activeChannelId={activeChannelId} />
        ))}
      </div>
      <p className="text-sm text-ink-soft">{READ_ONLY_NOTE}</p>
      <MarkerList channels={channels} activeChannelId={activeChannelId} />
    </div>
  );
}
