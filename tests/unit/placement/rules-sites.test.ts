import { describe, expect, it } from "vitest";
import { placementFindings, PLACEMENT_SOURCES } from "@/lib/placement";
import { at, codesFor, findingFor } from "./helpers";

const forearm = at("left-forearm-dorsal");
const forearmLow = { view: "back", x: 90, y: 440 } as const;

describe("placement-front-neck (blocks)", () => {
  it("blocks a marker on the front of the neck", () => {
    const f = findingFor(at("front-neck"), at("front-chest-left"), "placement-front-neck");
    // source: IEC 60601-2-10:2012 (as summarised in REFERENCES): the front of the neck (carotid sinus) is warned against
    expect(f.severity).toBe("blocks");
    expect(f.source).toBe(PLACEMENT_SOURCES.iecFrontNeck);
    expect(f.electrodes).toEqual([0]);
  });

  it("is absent when both markers are on the arm", () => {
    // source: IEC 60601-2-10:2012 (as summarised in REFERENCES): the warning is about the front of the neck only
    expect(codesFor(forearm, forearmLow)).not.toContain("placement-front-neck");
  });
});

describe("placement-head (blocks)", () => {
  it("blocks a marker on the head, front or back", () => {
    // source: IEC 60601-2-10:2012 (as summarised in REFERENCES): stimulation across the head is warned against
    expect(findingFor(at("front-head"), forearm, "placement-head").severity).toBe("blocks");
    expect(findingFor(forearm, at("back-head"), "placement-head").electrodes).toEqual([1]);
  });

  it("is absent off the head", () => {
    // source: IEC 60601-2-10:2012 (as summarised in REFERENCES)
    expect(codesFor(at("back-neck"), at("back-upper-trapezius-left"))).not.toContain("placement-head");
  });
});

describe("placement-near-front-neck (warning)", () => {
  it("warns when a chest marker sits within about 3 cm of the front of the neck", () => {
    const f = findingFor({ view: "front", x: 250, y: 178 }, at("left-shoulder-anterior"), "placement-near-front-neck");
    // source: IEC 60601-2-10:2012 (as summarised in REFERENCES) for the neck; the 3 cm margin is about the radius of
    // a 2 in round electrode (common practice (no published source) that 2 in is usual; 2.54 cm by arithmetic)
    expect(f.severity).toBe("warning");
    expect(f.numbers?.distanceToFrontNeckCm).toBeLessThan(3);
  });

  it("is absent further down the chest, and in the back view", () => {
    // source: IEC 60601-2-10:2012 (as summarised in REFERENCES); the margin as above
    expect(codesFor({ view: "front", x: 270, y: 240 }, at("left-shoulder-anterior"))).not.toContain("placement-near-front-neck");
    expect(codesFor({ view: "back", x: 250, y: 178 }, at("back-scapula-left"))).not.toContain("placement-near-front-neck");
  });
});

describe("placement-back-neck (warning)", () => {
  it("warns about a marker on the back of the neck", () => {
    // common practice (no published source)
    expect(findingFor(at("back-neck"), at("back-upper-trapezius-left"), "placement-back-neck").severity).toBe("warning");
  });

  it("is absent for the top of the shoulder", () => {
    // common practice (no published source)
    expect(codesFor(at("back-upper-trapezius-left"), at("left-deltoid"))).not.toContain("placement-back-neck");
  });
});

describe("placement-on-chest (warning)", () => {
  it("warns about a marker on the front of the chest, even with both on one side", () => {
    // common practice (no published source)
    const codes = codesFor(at("front-chest-left"), at("left-shoulder-anterior"));
    expect(codes).toContain("placement-on-chest");
    expect(codes).not.toContain("placement-across-chest");
  });

  it("is absent for the front of the shoulder and the arm", () => {
    // common practice (no published source)
    expect(codesFor(at("left-shoulder-anterior"), at("left-upper-arm-anterior"))).not.toContain("placement-on-chest");
  });
});

describe("a usual forearm placement", () => {
  it("raises nothing at all", () => {
    // common practice (no published source): wrist and finger extensors, two markers well apart on the forearm
    expect(placementFindings([forearm, forearmLow])).toEqual([]);
  });
});
