import { LIMB_REGIONS, type PlacedElectrode } from "./rule-helpers";
import { ELECTRODE_LETTERS, PLACEMENT_DEFER, PLACEMENT_SOURCES } from "./sources";
import type { PlacementFinding, Zone } from "./types";

/** Zones over the thorax, by the face of the chest they lie on. The front of the shoulder counts as chest area. */
const THORAX_FRONT = new Set([
  "front-chest-left", "front-chest-right", "left-shoulder-anterior", "right-shoulder-anterior",
]);
const THORAX_BACK = new Set(["back-scapula-left", "back-scapula-right", "back-mid-left", "back-mid-right"]);
const overThorax = (zone: Zone) => THORAX_FRONT.has(zone.id) || THORAX_BACK.has(zone.id);
const onLimb = (zone: Zone) => LIMB_REGIONS.has(zone.region);

const ACROSS_MOVE = "Put both electrodes of a channel on the same side of the body, or use a separate channel for each side.";

// Rules about the path the current takes between the two electrodes of one channel. At most one of them applies:
// a pair on opposite sides is described by the most specific path, and a same-side pair can only run front to back.
// Front of the shoulder to the back of the shoulder is left alone: that path runs through the shoulder, not the chest.
export function pathFindings(placed: readonly PlacedElectrode[]): PlacementFinding[] {
  const [a, b] = placed;
  if (!a?.zone || !b?.zone) return [];
  const [za, zb] = [a.zone, b.zone];
  const electrodes = [a.index, b.index] as const;
  const opposite = (za.side === "left" && zb.side === "right") || (za.side === "right" && zb.side === "left");
  if (opposite && overThorax(za) && overThorax(zb)) {
    return [{
      code: "placement-across-chest",
      severity: "blocks",
      title: "Current path across the chest",
      explanation:
        "The two electrodes of this channel are on opposite sides of the chest, so the current would cross the " +
        "chest, where the heart lies. The standard for these stimulators warns against transthoracic " +
        `stimulation. ${ACROSS_MOVE}`,
      source: PLACEMENT_SOURCES.iecTransthoracic,
      electrodes,
    }];
  }
  if (opposite && onLimb(za) && onLimb(zb)) {
    return [{
      code: "placement-across-arms",
      severity: "blocks",
      title: "Current path from one arm to the other",
      explanation:
        `Electrode ${ELECTRODE_LETTERS[a.index]} is on the ${za.side} arm and electrode ` +
        `${ELECTRODE_LETTERS[b.index]} on the ${zb.side} arm, so the current between them would cross the trunk and the ` +
        "chest. The standard for these stimulators warns against transthoracic stimulation. Use a separate " +
        "channel for each arm.",
      source: PLACEMENT_SOURCES.iecTransthoracicReading,
      electrodes,
    }];
  }
  if (opposite) {
    return [{
      code: "placement-across-midline",
      severity: "blocks",
      title: "Current path across the body",
      explanation:
        "One electrode of this channel is on the client's left side and the other on their right, so the " +
        "current would cross the trunk; in the upper body that path crosses or runs close to the chest, which " +
        `the standard for these stimulators warns against. ${ACROSS_MOVE}`,
      source: PLACEMENT_SOURCES.iecTransthoracicReading,
      electrodes,
    }];
  }
  const frontToBack =
    (za.region === "chest" && THORAX_BACK.has(zb.id)) || (zb.region === "chest" && THORAX_BACK.has(za.id));
  if (frontToBack) {
    return [{
      code: "placement-chest-front-to-back",
      severity: "blocks",
      title: "Current path through the chest, front to back",
      explanation:
        "One electrode of this channel is on the front of the chest and the other on the back of the chest, so " +
        "the current would pass through the chest, where the heart lies. The standard for these stimulators " +
        `warns against transthoracic stimulation. Keep both electrodes over the muscle being treated. ${PLACEMENT_DEFER}`,
      source: PLACEMENT_SOURCES.iecTransthoracicReading,
      electrodes,
    }];
  }
  return [];
}
