import { describe, expect, it } from "vitest";
import {
  MIDLINE_X,
  VIEW_BOX,
  ZONES,
  markerInZone,
  mirrorPolygon,
  pointInPolygon,
  signedArea,
  zoneAt,
  zoneById,
  zonesForView,
} from "@/lib/placement";
import type { Point } from "@/lib/placement";
import { isSimplePolygon } from "./helpers";

const oneCm2 = 25; // drawing units² at 5 units per cm (the scale is from memory, unverified)

describe("the zone catalogue", () => {
  it("gives every zone a unique, kebab-case id and a plain label", () => {
    const ids = ZONES.map((z) => z.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const zone of ZONES) {
      expect(zone.id).toMatch(/^[a-z]+(-[a-z]+)*$/);
      expect(zone.label).toMatch(/^[A-Z]/);
    }
    // Labels tell zones apart on their own within a view (the list and the screen reader rely on it).
    for (const view of ["front", "back"] as const) {
      const labels = zonesForView(view).map((z) => z.label);
      expect(new Set(labels).size).toBe(labels.length);
    }
  });

  it("has the zones the builder names, front and back", () => {
    const expected = [
      "front-head", "front-neck", "front-chest-left", "front-chest-right", "left-shoulder-anterior", "left-deltoid",
      "left-upper-arm-anterior", "left-upper-arm-posterior", "left-forearm-dorsal", "left-forearm-palmar",
      "left-hand-dorsal", "left-hand-palmar", "left-thenar", "left-hypothenar", "back-upper-trapezius-left",
      "back-scapula-left", "back-neck", "right-thenar", "right-forearm-dorsal", "back-scapula-right",
    ];
    for (const id of expected) expect(zoneById(id), id).toBeDefined();
    expect(zonesForView("front")).toHaveLength(20);
    expect(zonesForView("back")).toHaveLength(20);
  });

  it("gives every zone a non-degenerate, simple shape inside the view box", () => {
    for (const zone of ZONES) {
      expect(zone.points.length, zone.id).toBeGreaterThanOrEqual(3);
      expect(Math.abs(signedArea(zone.points)), zone.id).toBeGreaterThan(oneCm2);
      expect(isSimplePolygon(zone.points), zone.id).toBe(true);
      for (const [x, y] of zone.points) {
        expect(x >= 0 && x <= VIEW_BOX.width && y >= 0 && y <= VIEW_BOX.height, zone.id).toBe(true);
      }
    }
  });

  it("mirrors every left zone onto its right zone about the midline", () => {
    const lateral = ZONES.filter((z) => z.side === "left");
    expect(lateral).toHaveLength(18);
    for (const left of lateral) {
      const right = zoneById(left.id.replace("left", "right"));
      expect(right, left.id).toBeDefined();
      expect(right!.side).toBe("right");
      expect(right!.region).toBe(left.region);
      expect(right!.label.replace(/right/i, "side")).toBe(left.label.replace(/left/i, "side"));
      expect(right!.points).toEqual(mirrorPolygon(left.points));
    }
  });

  it("draws the client's left on the viewer's right from the front and on the viewer's left from behind", () => {
    for (const zone of ZONES.filter((z) => z.side === "left")) {
      const xs = zone.points.map(([x]) => x);
      if (zone.view === "front") expect(Math.min(...xs), zone.id).toBeGreaterThanOrEqual(MIDLINE_X);
      else expect(Math.max(...xs), zone.id).toBeLessThanOrEqual(MIDLINE_X);
    }
  });

  it("never lets two zones of a view overlap", () => {
    for (const view of ["front", "back"] as const) {
      // Half-unit offsets keep the samples off the (whole-number) vertices.
      for (let x = 0.5; x < VIEW_BOX.width; x += 3) {
        for (let y = 0.5; y < VIEW_BOX.height; y += 3) {
          const hits = zonesForView(view).filter((z) => pointInPolygon(x, y, z.points)).length;
          expect(hits).toBeLessThanOrEqual(1);
        }
      }
    }
  });

  it("leaves no gaps: every edge is shared exactly with a neighbour or faces off the body", () => {
    const key = ([ax, ay]: Point, [bx, by]: Point) => (ax < bx || (ax === bx && ay < by) ? `${ax},${ay}-${bx},${by}` : `${bx},${by}-${ax},${ay}`);
    for (const view of ["front", "back"] as const) {
      const zones = zonesForView(view);
      const edgeCount = new Map<string, number>();
      const edges = zones.flatMap((z) => z.points.map((p, i) => ({ zone: z, a: p, b: z.points[(i + 1) % z.points.length]! })));
      for (const e of edges) edgeCount.set(key(e.a, e.b), (edgeCount.get(key(e.a, e.b)) ?? 0) + 1);
      for (const { zone, a, b } of edges) {
        if (edgeCount.get(key(a, b)) === 2) continue;
        const [mx, my] = [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
        const length = Math.hypot(b[0] - a[0], b[1] - a[1]);
        const [nx, ny] = [(a[1] - b[1]) / length, (b[0] - a[0]) / length];
        // The zone lies on one side of its own edge; the other side must be off the body, not a sliver of a gap.
        const side = pointInPolygon(mx + nx * 0.5, my + ny * 0.5, zone.points) ? -1 : 1;
        for (const d of [0.5, 1.5]) {
          const hit = zoneAt(view, mx + side * nx * d, my + side * ny * d);
          expect(hit?.id, `${zone.id} edge ${key(a, b)}`).toBeUndefined();
        }
      }
    }
  });

  it("puts a marker placed on a zone inside that zone", () => {
    for (const zone of ZONES) {
      const marker = markerInZone(zone.id);
      expect(zoneAt(marker.view, marker.x, marker.y)?.id, zone.id).toBe(zone.id);
    }
  });
});
