import type { ChannelDerived } from "../derive";
import type { ChannelSettings } from "../schema";
import { EARLY_REST_PER_ON } from "../thresholds";
import { fmt } from "./format";
import { DEFER, SOURCES } from "./sources";
import type { Finding } from "./types";

/**
 * Early in a programme a rest of about five times the on time limits fatigue. The on time here counts the
 * ramps, since the muscle works through them; the explanation gives both counts.
 */
export function programmeFindings(s: ChannelSettings, d: ChannelDerived): Finding[] {
  const withRamps = d.cycle.restPerOnWithRamps;
  if (s.earlyProgramme !== true || withRamps === null || withRamps >= EARLY_REST_PER_ON) return [];
  const holdOnly = d.cycle.restPerOnHoldOnly;
  const holdText = holdOnly === null ? "" : ` (1 : ${fmt(holdOnly)} counting the hold only)`;
  return [
    {
      code: "short-rest-early",
      severity: "note",
      title: "Short rest for early in a programme",
      explanation:
        `On : rest is 1 : ${fmt(withRamps)} counting the ramps as on time${holdText}. Early in a ` +
        "programme a rest of about five times the on time (1 : 5) is usual to limit fatigue, progressing " +
        `to shorter rests as endurance builds. ${DEFER}`,
      source: SOURCES.commonPractice,
      numbers: { restPerOnWithRamps: withRamps, ...(holdOnly === null ? {} : { restPerOnHoldOnly: holdOnly }) },
    },
  ];
}
