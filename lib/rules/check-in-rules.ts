import type { SkinLevel } from "@/lib/check-ins/skin-scale";
import { SKIN_SCALE } from "@/lib/check-ins/skin-scale";

// The rules a new check-in is held against. Each raises at most one flag; the thresholds are common practice (no
// published source) unless noted.
export type FlagSeverity = "review" | "urgent";
export type RaisedFlag = { rule: string; severity: FlagSeverity; title: string; detail: Record<string, unknown> };

export type CheckInFacts = {
  channels: { channelId: string; number: number; amplitudeMa: number; ceilingMa: number | null }[];
  skin: { channelId: string; channelNumber: number; electrode: "A" | "B"; level: SkinLevel; spreads: boolean; itch: boolean }[];
  comfort: number;
  previousComfort: number | null;
};

export const RULES = {
  skinReview: "skin-level-3-or-above",
  skinUrgent: "skin-level-5",
  amplitudeAboveCeiling: "amplitude-above-ceiling",
  lowComfortTwice: "comfort-3-or-less-twice",
} as const;

export const REVIEW_SKIN_LEVEL = 3;
export const URGENT_SKIN_LEVEL = 5;
export const LOW_COMFORT = 3;

export function flagsForCheckIn(facts: CheckInFacts): RaisedFlag[] {
  const flags: RaisedFlag[] = [];
  const worst = [...facts.skin].sort((a, b) => b.level - a.level)[0];
  if (worst && worst.level >= URGENT_SKIN_LEVEL) {
    flags.push({
      rule: RULES.skinUrgent,
      severity: "urgent",
      title: `Urgent: ${SKIN_SCALE[worst.level].words.toLowerCase()} under channel ${worst.channelNumber}, electrode ${worst.electrode}`,
      detail: { sites: facts.skin.filter((s) => s.level >= URGENT_SKIN_LEVEL) },
    });
  } else if (worst && worst.level >= REVIEW_SKIN_LEVEL) {
    flags.push({
      rule: RULES.skinReview,
      severity: "review",
      title: `Skin: ${SKIN_SCALE[worst.level].words.toLowerCase()} under channel ${worst.channelNumber}, electrode ${worst.electrode}`,
      detail: { sites: facts.skin.filter((s) => s.level >= REVIEW_SKIN_LEVEL) },
    });
  }
  const over = facts.channels.filter((c) => c.ceilingMa !== null && c.amplitudeMa > c.ceilingMa);
  if (over.length > 0) {
    flags.push({
      rule: RULES.amplitudeAboveCeiling,
      severity: "review",
      title: `Strength above the programme's ceiling on channel ${over.map((c) => c.number).join(" and ")}`,
      detail: { channels: over },
    });
  }
  if (facts.comfort <= LOW_COMFORT && facts.previousComfort !== null && facts.previousComfort <= LOW_COMFORT) {
    flags.push({
      rule: RULES.lowComfortTwice,
      severity: "review",
      title: `Comfort ${facts.comfort}/10 after ${facts.previousComfort}/10 last time`,
      detail: { comfort: facts.comfort, previousComfort: facts.previousComfort },
    });
  }
  return flags;
}
