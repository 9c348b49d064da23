import { describe, expect, it } from "vitest";
import { markerZone, zoneAt } from "@/lib/placement";

describe("zoneAt", () => {
  it("finds the zone a point falls in, front view (the client's left on the viewer's right)", () => {
    expect(zoneAt("front", 240, 80)?.id).toBe("front-head");
    expect(zoneAt("front", 240, 155)?.id).toBe("front-neck");
    expect(zoneAt("front", 200, 240)?.id).toBe("front-chest-right");
    expect(zoneAt("front", 280, 240)?.id).toBe("front-chest-left");
    expect(zoneAt("front", 300, 400)?.id).toBe("front-abdomen-left");
    expect(zoneAt("front", 135, 215)?.id).toBe("right-shoulder-anterior");
    expect(zoneAt("front", 350, 300)?.id).toBe("left-upper-arm-anterior");
    expect(zoneAt("front", 370, 410)?.id).toBe("left-forearm-palmar");
    expect(zoneAt("front", 94, 480)?.id).toBe("right-wrist-palmar");
    expect(zoneAt("front", 60, 518)?.id).toBe("right-thenar");
    expect(zoneAt("front", 78, 560)?.id).toBe("right-hand-palmar");
    expect(zoneAt("front", 103, 515)?.id).toBe("right-hypothenar");
    expect(zoneAt("front", 420, 518)?.id).toBe("left-thenar");
  });

  it("finds the zone a point falls in, back view (the client's left on the viewer's left)", () => {
    expect(zoneAt("back", 240, 80)?.id).toBe("back-head");
    expect(zoneAt("back", 240, 155)?.id).toBe("back-neck");
    expect(zoneAt("back", 200, 190)?.id).toBe("back-upper-trapezius-left");
    expect(zoneAt("back", 200, 250)?.id).toBe("back-scapula-left");
    expect(zoneAt("back", 300, 250)?.id).toBe("back-scapula-right");
    expect(zoneAt("back", 200, 320)?.id).toBe("back-mid-left");
    expect(zoneAt("back", 200, 420)?.id).toBe("back-lower-left");
    expect(zoneAt("back", 135, 215)?.id).toBe("left-deltoid");
    expect(zoneAt("back", 130, 300)?.id).toBe("left-upper-arm-posterior");
    expect(zoneAt("back", 110, 410)?.id).toBe("left-forearm-dorsal");
    expect(zoneAt("back", 78, 560)?.id).toBe("left-hand-dorsal");
    expect(zoneAt("back", 402, 560)?.id).toBe("right-hand-dorsal");
  });

  it("returns null off the body", () => {
    expect(zoneAt("front", 20, 20)).toBeNull(); // the corner of the view box
    expect(zoneAt("front", 240, 560)).toBeNull(); // below the trunk, between the hands
    expect(zoneAt("front", 150, 420)).toBeNull(); // the gap between the arm and the trunk
    expect(zoneAt("back", -10, 300)).toBeNull(); // outside the view box
    expect(zoneAt("back", Number.NaN, 300)).toBeNull();
  });

  it("derives a marker's zone from its view and position", () => {
    expect(markerZone({ view: "back", x: 110, y: 410 })?.label).toBe("Left forearm, back of the arm (wrist and finger extensors)");
    expect(markerZone({ view: "front", x: 110, y: 410 })?.label).toBe("Right forearm, palm side (wrist and finger flexors)");
  });
});
