import { describe, expect, it } from "vitest";
import { afterChecklist, beforeChecklist, sessionPlanFromVersion, sessionWords } from "@/components/guided-session/session-plan";
import { opensCycle, phaseAnnouncement, shortDuration } from "@/components/guided-session/timer-words";
import { channelTimerState } from "@/lib/session-timer";
import type { ProgrammeContent } from "@/lib/programmes/content";

const arthur = { rampUpS: 1, holdS: 5, rampDownS: 1, restS: 25 };

// Only the fields the session reads; the rest of a version's content is not used here.
const content = {
  channels: [{ id: "ch-1", target: "Wrist and finger extensors", settings: { ...arthur, frequencyHz: 35 } }],
  schedule: { minutesPerSession: 30 },
  skinPreparation: ["Wash and dry the skin.", "Check the skin."],
  electrodeCare: ["Peel from a corner."],
  ownCautions: [],
} as unknown as ProgrammeContent;

describe("what the session shows", () => {
  it("lists the version's skin preparation, then the placement and the settings with a link to them", () => {
    const plan = sessionPlanFromVersion({ id: "v1", number: 3, content });
    expect(plan.channels).toEqual([{ id: "ch-1", label: "Channel 1: Wrist and finger extensors", cycle: arthur }]);
    const items = beforeChecklist(plan);
    expect(items.map((item) => item.text)).toEqual([
      "Wash and dry the skin.",
      "Check the skin.",
      "Electrodes placed as in the photo and drawing, and smoothed flat",
      "The stimulator is set to version 3 of the programme",
    ]);
    expect(items.at(-1)?.link?.href).toBe("/programme");
    expect(afterChecklist(plan).map((item) => item.id)).toEqual(["care-0"]);
  });

  it("speaks to the client, or to a carer about the client", () => {
    expect(sessionWords(null).title).toBe("Your session");
    expect(sessionWords("Arthur")).toMatchObject({ title: "Arthur's session", your: "Arthur's" });
  });

  it("announces each phase once, with the cycle as it opens", () => {
    const start = channelTimerState(arthur, 30, 0);
    expect(opensCycle(start)).toBe(true);
    expect(phaseAnnouncement(start, opensCycle(start))).toBe("Cycle 1. Ramp up, 1 second.");
    // worked example (our own arithmetic): the hold runs 1–6 s; its announcement is the same at 2 s and at 5.9 s.
    const hold = channelTimerState(arthur, 30, 2);
    expect(opensCycle(hold)).toBe(false);
    expect(phaseAnnouncement(hold, false)).toBe("Hold, 5 seconds.");
    expect(phaseAnnouncement(channelTimerState(arthur, 30, 5.9), false)).toBe("Hold, 5 seconds.");
    // worked example (our own arithmetic): with no ramp-up, cycle 2 (from 15 s) opens on its hold.
    const noRamp = channelTimerState({ rampUpS: 0, holdS: 5, rampDownS: 0, restS: 10 }, 30, 15.5);
    expect(opensCycle(noRamp)).toBe(true);
    expect(phaseAnnouncement(noRamp, true, "Channel 1: ")).toBe("Channel 1: Cycle 2. Hold, 5 seconds.");
  });

  it("writes durations briefly", () => {
    // worked example (our own arithmetic): 1792 s = 29 min 52 s; 1740 s = 29 min exactly.
    expect(shortDuration(1792)).toBe("29 min 52 s");
    expect(shortDuration(1740)).toBe("29 min");
    expect(shortDuration(24)).toBe("24 s");
  });
});
