import type { Marker } from "@/lib/placement";

/** The two markers of a channel, electrode A then electrode B; `null` until placed. */
export type MarkerTuple = [Marker | null, Marker | null];

export interface OutlineChannel {
  id: string;
  /** The channel's name in words, used as is in accessible names: "Channel 1", or "Channel 1: wrist extension". */
  label: string;
  /**
   * Picks the number written on its markers (index + 1) and its drawing style (shape and line pattern).
   * Defaults to the channel's position in `channels`.
   */
  index?: number;
  markers: readonly [Marker | null, Marker | null];
}
