import type { ChannelSeries } from "./channels";
import { worstSkin } from "./skin";
import type { LoggedBy, PlacedCheckIn } from "./types";
import type { SkinLevel } from "@/lib/check-ins/skin-scale";

export type SessionRow = {
  checkInId: string;
  day: string;
  x: number;
  versionNumber: number | null;
  minutes: number;
  comfort: number;
  /** Null only for a session with no skin check, which the check-in form does not allow. */
  worstSkinLevel: SkinLevel | null;
  /** Where the worst level was seen: "Channel 1, electrode B". */
  worstSkinSites: string[];
  loggedBy: LoggedBy;
};

// A site is named by the channel's number in the trends (the latest version's numbering) and its electrode.
export function sessionRows(placed: PlacedCheckIn[], channels: ChannelSeries[]): SessionRow[] {
  const channelName = (id: string) => channels.find((c) => c.id === id)?.shortLabel ?? id;
  return placed.map((checkIn) => {
    const worst = worstSkin(checkIn.skin);
    return {
      checkInId: checkIn.id,
      day: checkIn.sessionDate,
      x: checkIn.x,
      versionNumber: checkIn.versionNumber,
      minutes: checkIn.minutes,
      comfort: checkIn.comfort,
      worstSkinLevel: worst?.level ?? null,
      worstSkinSites: worst?.sites.map((site) => `${channelName(site.channelId)}, electrode ${site.electrode}`) ?? [],
      loggedBy: checkIn.loggedBy,
    };
  });
}
