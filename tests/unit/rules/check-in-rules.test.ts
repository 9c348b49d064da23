import { describe, expect, it } from "vitest";
import { icdrgReading } from "@/lib/check-ins/skin-scale";
import { flagsForCheckIn, RULES, type CheckInFacts } from "@/lib/rules/check-in-rules";

// Invented check-in facts; one channel, two electrodes, within the ceiling, comfortable, skin unchanged.
function facts(overrides: Partial<CheckInFacts> = {}): CheckInFacts {
  return {
    channels: [{ channelId: "ch-1", number: 1, amplitudeMa: 18, ceilingMa: 30 }],
    skin: [
      { channelId: "ch-1", channelNumber: 1, electrode: "A", level: 1, spreads: false, itch: false },
      { channelId: "ch-1", channelNumber: 1, electrode: "B", level: 2, spreads: false, itch: false },
    ],
    comfort: 7,
    previousComfort: 6,
    ...overrides,
  };
}

const withSkin = (level: 1 | 2 | 3 | 4 | 5) => facts({ skin: [{ channelId: "ch-1", channelNumber: 1, electrode: "B", level, spreads: false, itch: false }] });
const rules = (f: CheckInFacts) => flagsForCheckIn(f).map((flag) => `${flag.rule}:${flag.severity}`);

describe("flags raised by a check-in", () => {
  it("raises nothing for an unremarkable session", () => {
    expect(flagsForCheckIn(facts())).toEqual([]);
  });

  it("leaves faint pinkness that fades alone, and flags skin from level 3 up for review", () => {
    // common practice (no published source): faint pinkness confined to the electrode that fades within about an
    // hour is usually normal (REFERENCES marks this from memory, unverified); redness that persists needs the therapist.
    expect(rules(withSkin(2))).toEqual([]);
    expect(rules(withSkin(3))).toEqual([`${RULES.skinReview}:review`]);
    expect(rules(withSkin(4))).toEqual([`${RULES.skinReview}:review`]);
  });

  it("makes blisters, broken skin or a burn mark urgent, and raises only the urgent flag", () => {
    // common practice (no published source): blisters or broken skin mean stop and contact the clinic.
    const raised = flagsForCheckIn(withSkin(5));
    expect(raised.map((f) => `${f.rule}:${f.severity}`)).toEqual([`${RULES.skinUrgent}:urgent`]);
    expect(raised[0]!.title).toContain("channel 1, electrode B");
  });

  it("flags a strength above the programme's ceiling, but not one at it", () => {
    // common practice (no published source): the amplitude ceiling is the most the client may turn up to.
    expect(rules(facts({ channels: [{ channelId: "ch-1", number: 1, amplitudeMa: 30, ceilingMa: 30 }] }))).toEqual([]);
    expect(rules(facts({ channels: [{ channelId: "ch-1", number: 1, amplitudeMa: 31, ceilingMa: 30 }] }))).toEqual([`${RULES.amplitudeAboveCeiling}:review`]);
  });

  it("flags comfort of 3 or less only when it is the second time running", () => {
    // common practice (no published source): one uncomfortable session can happen; two running need a look.
    expect(rules(facts({ comfort: 3, previousComfort: 8 }))).toEqual([]);
    expect(rules(facts({ comfort: 3, previousComfort: null }))).toEqual([]);
    expect(rules(facts({ comfort: 2, previousComfort: 3 }))).toEqual([`${RULES.lowComfortTwice}:review`]);
    expect(rules(facts({ comfort: 4, previousComfort: 1 }))).toEqual([]);
  });
});

describe("the therapist's ICDRG reading of a skin level", () => {
  it("maps each plain-language level onto the reading scale", () => {
    // source: ICDRG patch-test reading scale as given in REFERENCES (− ?+ + ++ +++); the mapping is ours
    // (common practice, no published source).
    expect(icdrgReading(1, false, false)).toMatch(/^− negative/);
    expect(icdrgReading(2, false, false)).toMatch(/^\?\+ doubtful/);
    expect(icdrgReading(3, false, false)).toMatch(/^\+ weak/);
    expect(icdrgReading(4, false, false)).toMatch(/^\+\+ strong/);
    expect(icdrgReading(5, false, false)).toMatch(/^\+\+\+ extreme/);
  });

  it("points to a possible allergy when the reaction spreads beyond the electrode or itches", () => {
    expect(icdrgReading(3, true, false)).toContain("spreads beyond the electrode");
    expect(icdrgReading(3, false, false)).not.toContain("allergic");
  });
});
