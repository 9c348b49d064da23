// No "use client" here: with `readOnly` this renders on the server with no client code at all; otherwise it hands
// over to the interactive editor, which is a client component.
import { BodyOutlineEditor } from "./body-outline-editor";
import { BodyOutlineReadOnly } from "./body-outline-read-only";
import type { View } from "@/lib/placement";
import type { MarkerTuple, OutlineChannel } from "./types";

export type BodyOutlineProps =
  | {
      readOnly: true;
      channels: readonly OutlineChannel[];
      /** When given, the other channels are drawn muted. */
      activeChannelId?: string;
      /** Which views to draw; by default those that hold a marker. */
      views?: readonly View[];
    }
  | {
      readOnly?: false;
      channels: readonly OutlineChannel[];
      /** The channel whose markers are placed, dragged and checked; the others are drawn muted. */
      activeChannelId: string;
      /** Called with the channel's two markers (A, B) whenever one is placed, moved or removed. */
      onChange: (channelId: string, markers: MarkerTuple) => void;
    };

/** Rampline's body outline with electrode markers, front and back. See components/body-outline/NOTES.md. */
export function BodyOutline(props: BodyOutlineProps) {
  if (props.readOnly) {
    return <BodyOutlineReadOnly channels={props.channels} activeChannelId={props.activeChannelId} views={props.views} />;
  }
  return <BodyOutlineEditor channels={props.channels} activeChannelId={props.activeChannelId} onChange={props.onChange} />;
}
