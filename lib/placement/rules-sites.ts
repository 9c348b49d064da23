import { distanceToPolygon } from "./polygon";
import { electrodeWords, verb, type PlacedElectrode } from "./rule-helpers";
import { PLACEMENT_DEFER, PLACEMENT_SOURCES } from "./sources";
import type { PlacementFinding, Zone } from "./types";
import { NEAR_FRONT_NECK_CM, cmToUnits, unitsToCm } from "./view-box";
import { zoneById } from "./zone-lookup";

const on = (placed: readonly PlacedElectrode[], test: (zone: Zone) => boolean) =>
  placed.filter((e) => e.zone !== null && test(e.zone)).map((e) => e.index);

// Rules about where a single electrode sits, whatever the other one does.
export function siteFindings(placed: readonly PlacedElectrode[]): PlacementFinding[] {
  const out: PlacementFinding[] = [];
  const head = on(placed, (z) => z.region === "head");
  if (head.length > 0) {
    out.push({
      code: "placement-head",
      severity: "blocks",
      title: "Electrode on the head",
      explanation:
        `${electrodeWords(head)} ${verb(head)} on the head. The standard for these stimulators warns against ` +
        "stimulation across the head, over the eyes or over the mouth. Move it: Rampline will not publish a " +
        "placement on the head.",
      source: PLACEMENT_SOURCES.iecHead,
      electrodes: head,
    });
  }
  const frontNeck = on(placed, (z) => z.id === "front-neck");
  if (frontNeck.length > 0) {
    out.push({
      code: "placement-front-neck",
      severity: "blocks",
      title: "Electrode on the front of the neck",
      explanation:
        `${electrodeWords(frontNeck)} ${verb(frontNeck)} on the front of the neck, over the carotid sinus, where ` +
        "stimulation can affect the heart rate and blood pressure. The standard for these stimulators warns " +
        "against it. Move it: Rampline will not publish a placement on the front of the neck.",
      source: PLACEMENT_SOURCES.iecFrontNeck,
      electrodes: frontNeck,
    });
  }
  const neck = zoneById("front-neck")!;
  const near = placed.filter(
    (e) => e.zone !== null && e.zone.region !== "neck" && e.zone.region !== "head" && e.marker.view === "front" &&
      distanceToPolygon(e.marker.x, e.marker.y, neck.points) < cmToUnits(NEAR_FRONT_NECK_CM),
  );
  if (near.length > 0) {
    const closest = Math.min(...near.map((e) => distanceToPolygon(e.marker.x, e.marker.y, neck.points)));
    const indexes = near.map((e) => e.index);
    out.push({
      code: "placement-near-front-neck",
      severity: "warning",
      title: "Electrode close to the front of the neck",
      explanation:
        `${electrodeWords(indexes)} ${verb(indexes)} marked within about ${NEAR_FRONT_NECK_CM} cm of the front of ` +
        "the neck, so the edge of an electrode may reach it. Check on the body that the whole electrode stays " +
        `clear of the front of the neck. ${PLACEMENT_DEFER}`,
      source: PLACEMENT_SOURCES.nearFrontNeck,
      numbers: { distanceToFrontNeckCm: Math.round(unitsToCm(closest) * 10) / 10 },
      electrodes: indexes,
    });
  }
  const backNeck = on(placed, (z) => z.id === "back-neck");
  if (backNeck.length > 0) {
    out.push({
      code: "placement-back-neck",
      severity: "warning",
      title: "Electrode on the back of the neck",
      explanation:
        `${electrodeWords(backNeck)} ${verb(backNeck)} on the back of the neck, close to its sides and front. ` +
        "Check that this placement is intended and that the electrode stays clear of the sides and front of the " +
        `neck. ${PLACEMENT_DEFER}`,
      source: PLACEMENT_SOURCES.commonPractice,
      electrodes: backNeck,
    });
  }
  const chest = on(placed, (z) => z.region === "chest");
  if (chest.length > 0) {
    out.push({
      code: "placement-on-chest",
      severity: "warning",
      title: "Electrode on the front of the chest",
      explanation:
        `${electrodeWords(chest)} ${verb(chest)} on the front of the chest, over the heart and lungs. Keep the ` +
        "current path from crossing the chest and check the stimulator manufacturer's instructions about the " +
        `chest. ${PLACEMENT_DEFER}`,
      source: PLACEMENT_SOURCES.commonPractice,
      electrodes: chest,
    });
  }
  return out;
}
