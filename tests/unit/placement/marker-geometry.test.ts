import { describe, expect, it } from "vitest";
import {
  BIG_KEY_STEP_UNITS,
  KEY_STEP_UNITS,
  MARKER_RADIUS,
  clampToView,
  clientToViewBox,
  positionPercent,
  stepMarker,
} from "@/components/body-outline/marker-geometry";
import { UNITS_PER_CM, VIEW_BOX, ZONES } from "@/lib/placement";

const m = { view: "front", x: 200, y: 300 } as const;

describe("keyboard steps", () => {
  it("moves 1 cm per arrow and 5 cm with Shift, in screen directions", () => {
    // from memory, unverified: 5 drawing units per cm
    expect(KEY_STEP_UNITS).toBe(UNITS_PER_CM);
    expect(stepMarker(m, "ArrowLeft", false)).toEqual({ view: "front", x: 195, y: 300 });
    expect(stepMarker(m, "ArrowRight", false)).toEqual({ view: "front", x: 205, y: 300 });
    expect(stepMarker(m, "ArrowUp", true)).toEqual({ view: "front", x: 200, y: 300 - BIG_KEY_STEP_UNITS });
    expect(stepMarker(m, "ArrowDown", true)).toEqual({ view: "front", x: 200, y: 325 });
  });

  it("keeps the whole marker inside the view box and ignores other keys", () => {
    const r = MARKER_RADIUS;
    expect(stepMarker({ view: "back", x: r + 2, y: 580 }, "ArrowLeft", true)).toEqual({ view: "back", x: r, y: 580 });
    expect(stepMarker({ view: "back", x: 100, y: 580 }, "ArrowDown", true)).toEqual({ view: "back", x: 100, y: VIEW_BOX.height - r });
    expect(stepMarker(m, "Enter", false)).toBeNull();
    expect(clampToView(-5, 700)).toEqual({ x: r, y: VIEW_BOX.height - r });
    expect(clampToView(500, -1)).toEqual({ x: VIEW_BOX.width - r, y: r });
    expect(clampToView(240, 300)).toEqual({ x: 240, y: 300 });
  });

  it("can still reach every zone: none comes within a marker's radius of the edge", () => {
    for (const zone of ZONES) {
      for (const [x, y] of zone.points) expect(clampToView(x, y), zone.id).toEqual({ x, y });
    }
  });
});

describe("pointer position → drawing units", () => {
  it("maps a box of the view box's shape linearly", () => {
    const rect = { left: 100, top: 50, width: 240, height: 300 }; // half size
    expect(clientToViewBox(100, 50, rect)).toEqual({ x: 0, y: 0 });
    expect(clientToViewBox(340, 350, rect)).toEqual({ x: 480, y: 600 });
    expect(clientToViewBox(220, 200, rect)).toEqual({ x: 240, y: 300 });
  });

  it("allows for the margins a wider or taller box leaves (xMidYMid meet)", () => {
    // 960 × 600 box: the drawing is 480 wide at scale 1, centred with 240 px either side.
    expect(clientToViewBox(240, 0, { left: 0, top: 0, width: 960, height: 600 })).toEqual({ x: 0, y: 0 });
    expect(clientToViewBox(100, 0, { left: 0, top: 0, width: 960, height: 600 })?.x).toBe(-140);
    // 480 × 800 box: scale 1, 100 px above and below.
    expect(clientToViewBox(0, 400, { left: 0, top: 0, width: 480, height: 800 })).toEqual({ x: 0, y: 300 });
  });

  it("gives null for an SVG with no size yet", () => {
    expect(clientToViewBox(10, 10, { left: 0, top: 0, width: 0, height: 0 })).toBeNull();
  });

  it("says where a marker is in per cent of the drawing", () => {
    expect(positionPercent({ view: "front", x: 240, y: 150 })).toEqual({ across: 50, down: 25 });
  });
});
