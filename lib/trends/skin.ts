import { SKIN_SCALE, type SkinLevel } from "@/lib/check-ins/skin-scale";
import type { TrendCheckIn, WorstSkin } from "./types";

// The worst reading of a session is the highest level under any electrode; every electrode at that level is named,
// because two sites at the same level say more than one.
export function worstSkin(skin: TrendCheckIn["skin"]): WorstSkin | null {
  if (skin.length === 0) return null;
  const level = Math.max(...skin.map((site) => site.level));
  if (!(level in SKIN_SCALE)) throw new Error(`A skin level must be 1 to 5, not ${level}.`);
  return {
    level: level as SkinLevel,
    sites: skin.filter((site) => site.level === level).map(({ channelId, electrode }) => ({ channelId, electrode })),
  };
}

export function skinLevelWords(level: SkinLevel): string {
  return SKIN_SCALE[level].words;
}
