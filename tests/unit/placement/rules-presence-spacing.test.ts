import { describe, expect, it } from "vitest";
import { markerSpacingCm, placementFindings, placementOk, UNITS_PER_CM } from "@/lib/placement";
import { at, codesFor, findingFor } from "./helpers";

const a = { view: "back", x: 110, y: 400 } as const;

describe("placement-marker-missing (blocks)", () => {
  it("blocks until both electrodes are placed", () => {
    // common practice (no published source): a channel's current flows between its two electrodes
    expect(findingFor(null, null, "placement-marker-missing").electrodes).toEqual([0, 1]);
    const one = findingFor(a, null, "placement-marker-missing");
    expect(one.severity).toBe("blocks");
    expect(one.explanation).toContain("Electrode B has not been placed");
    expect(placementOk(placementFindings([a, null]))).toBe(false);
  });

  it("is absent once both are placed", () => {
    // common practice (no published source)
    expect(codesFor(a, { ...a, y: 440 })).not.toContain("placement-marker-missing");
  });
});

describe("placement-off-body (blocks)", () => {
  it("blocks a marker outside the outline and skips the path rules", () => {
    // common practice (no published source): both electrodes go on the body
    const f = findingFor({ view: "front", x: 20, y: 20 }, at("right-forearm-palmar"), "placement-off-body");
    expect(f.severity).toBe("blocks");
    expect(f.electrodes).toEqual([0]);
    expect(codesFor({ view: "front", x: 20, y: 20 }, at("right-forearm-palmar"))).toEqual(["placement-off-body"]);
  });

  it("is absent for markers on the body", () => {
    // common practice (no published source)
    expect(codesFor(a, { ...a, y: 440 })).not.toContain("placement-off-body");
  });
});

describe("placement-markers-close (warning)", () => {
  it("warns when the markers are closer than about 3 cm on the drawing, or on one spot", () => {
    // common practice (no published source): about 3 cm apart at least; 5 units per cm is from memory, unverified
    const close = findingFor(a, { ...a, y: a.y + 2 * UNITS_PER_CM }, "placement-markers-close");
    expect(close.severity).toBe("warning");
    expect(close.title).toBe("These two markers are very close");
    expect(close.explanation).toContain("Check the spacing on the body");
    expect(close.numbers?.markerSpacingCm).toBeCloseTo(2, 9);
    expect(findingFor(a, a, "placement-markers-close").explanation).toContain("same spot");
  });

  it("is absent at 3 cm or more, and across views", () => {
    // common practice (no published source): about 3 cm apart at least; the scale is from memory, unverified
    expect(codesFor(a, { ...a, y: a.y + 3 * UNITS_PER_CM })).not.toContain("placement-markers-close");
    // A front and a back marker at the same drawing position are on opposite faces of the arm: no distance on paper.
    expect(markerSpacingCm([{ index: 0, marker: a, zone: null }, { index: 1, marker: { ...a, view: "front" }, zone: null }])).toBeNull();
    expect(codesFor(a, { ...a, view: "front" })).not.toContain("placement-markers-close");
  });
});
