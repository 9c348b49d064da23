import { describe, expect, it } from "vitest";
import { bodyRegionForMarkers } from "@/lib/placement";
import { at } from "./helpers";

describe("bodyRegionForMarkers", () => {
  it("maps each arm region to lib/stim's bodyRegion", () => {
    // common practice (no published source): the overflow rule's regions
    expect(bodyRegionForMarkers([at("left-thenar"), at("left-hand-palmar")])).toBe("hand-wrist");
    expect(bodyRegionForMarkers([at("right-wrist-dorsal"), at("right-hand-dorsal")])).toBe("hand-wrist");
    expect(bodyRegionForMarkers([at("left-forearm-dorsal"), at("left-forearm-dorsal")])).toBe("forearm");
    expect(bodyRegionForMarkers([at("left-upper-arm-posterior"), at("left-upper-arm-anterior")])).toBe("upper-arm");
    expect(bodyRegionForMarkers([at("left-deltoid"), at("back-upper-trapezius-left")])).toBe("shoulder");
    expect(bodyRegionForMarkers([at("back-scapula-left"), at("back-mid-left")])).toBe("other");
  });

  it("takes the most distal region when the two differ, so forearm to hand counts as hand and wrist", () => {
    // common practice (no published source): overflow is above all a hand and wrist concern
    expect(bodyRegionForMarkers([at("left-forearm-dorsal"), at("left-hand-dorsal")])).toBe("hand-wrist");
    expect(bodyRegionForMarkers([at("left-upper-arm-posterior"), at("left-forearm-dorsal")])).toBe("forearm");
  });

  it("uses the one electrode on the body, and is undefined with none", () => {
    expect(bodyRegionForMarkers([at("left-wrist-palmar"), null])).toBe("hand-wrist");
    expect(bodyRegionForMarkers([null, { view: "front", x: 5, y: 5 }])).toBeUndefined();
    expect(bodyRegionForMarkers([null, null])).toBeUndefined();
  });
});
