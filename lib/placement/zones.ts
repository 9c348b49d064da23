import { ARM, HAND_BACK, HEAD_HALF, NECK_HALF, PALM_SIDE, TRUNK_BACK, TRUNK_FRONT } from "./half-body-shapes";
import { mirrorPolygon, symmetricPolygon } from "./polygon";
import { VIEWS, type Point, type Region, type View, type Zone } from "./types";

type LateralSpec = {
  /** The id with `{side}` where "left" or "right" goes. */
  id: string;
  /** The label with `{side}` where "left" or "right" goes; its first letter is capitalised. */
  label: string;
  region: Region;
  /** Drawn for the viewer's left half of the view box. */
  half: readonly Point[];
};

const FRONT_LATERAL: readonly LateralSpec[] = [
  { id: "front-chest-{side}", label: "{side} side of the chest (collarbone to the lowest ribs)", region: "chest", half: TRUNK_FRONT.chest },
  { id: "front-abdomen-{side}", label: "{side} side of the abdomen", region: "abdomen", half: TRUNK_FRONT.abdomen },
  { id: "{side}-shoulder-anterior", label: "{side} shoulder, front (anterior deltoid)", region: "shoulder", half: ARM.shoulder },
  { id: "{side}-upper-arm-anterior", label: "{side} upper arm, front (biceps)", region: "upper-arm", half: ARM.upperArm },
  { id: "{side}-forearm-palmar", label: "{side} forearm, palm side (wrist and finger flexors)", region: "forearm", half: ARM.forearm },
  { id: "{side}-wrist-palmar", label: "{side} wrist, palm side", region: "hand-wrist", half: ARM.wrist },
  { id: "{side}-thenar", label: "{side} thumb and the ball of the thumb (thenar muscles)", region: "hand-wrist", half: PALM_SIDE.thenar },
  { id: "{side}-hand-palmar", label: "{side} hand, palm and fingers", region: "hand-wrist", half: PALM_SIDE.palm },
  { id: "{side}-hypothenar", label: "{side} hand, little-finger side of the palm (hypothenar muscles)", region: "hand-wrist", half: PALM_SIDE.hypothenar },
];

const BACK_LATERAL: readonly LateralSpec[] = [
  { id: "back-upper-trapezius-{side}", label: "Top of the {side} shoulder, from behind (upper trapezius, supraspinatus beneath)", region: "back", half: TRUNK_BACK.upperTrapezius },
  { id: "back-scapula-{side}", label: "{side} shoulder blade (infraspinatus, and the muscles between it and the spine)", region: "back", half: TRUNK_BACK.scapula },
  { id: "back-mid-{side}", label: "{side} side of the back below the shoulder blade (over the lower ribs)", region: "back", half: TRUNK_BACK.mid },
  { id: "back-lower-{side}", label: "{side} side of the lower back (below the ribs)", region: "back", half: TRUNK_BACK.lower },
  { id: "{side}-deltoid", label: "{side} shoulder, point and back (middle and posterior deltoid)", region: "shoulder", half: ARM.shoulder },
  { id: "{side}-upper-arm-posterior", label: "{side} upper arm, back (triceps)", region: "upper-arm", half: ARM.upperArm },
  { id: "{side}-forearm-dorsal", label: "{side} forearm, back of the arm (wrist and finger extensors)", region: "forearm", half: ARM.forearm },
  { id: "{side}-wrist-dorsal", label: "{side} wrist, back", region: "hand-wrist", half: ARM.wrist },
  { id: "{side}-hand-dorsal", label: "{side} hand, back of the hand, fingers and thumb", region: "hand-wrist", half: HAND_BACK },
];

const MIDLINE: Record<View, readonly Zone[]> = {
  front: [
    { id: "front-head", view: "front", label: "Head and face", side: "midline", region: "head", points: symmetricPolygon(HEAD_HALF) },
    { id: "front-neck", view: "front", label: "Front of the neck", side: "midline", region: "neck", points: symmetricPolygon(NECK_HALF) },
  ],
  back: [
    { id: "back-head", view: "back", label: "Back of the head", side: "midline", region: "head", points: symmetricPolygon(HEAD_HALF) },
    { id: "back-neck", view: "back", label: "Back of the neck", side: "midline", region: "neck", points: symmetricPolygon(NECK_HALF) },
  ],
};

const idFor = (template: string, side: "left" | "right") => template.replaceAll("{side}", side);
const labelFor = (template: string, side: "left" | "right") => {
  const text = template.replaceAll("{side}", side);
  return text.charAt(0).toUpperCase() + text.slice(1);
};

// Facing the viewer, the client's right side is on the viewer's left; from behind, their left side is.
const VIEWER_LEFT_IS: Record<View, "left" | "right"> = { front: "right", back: "left" };

function lateralZones(view: View, specs: readonly LateralSpec[]): Zone[] {
  const near = VIEWER_LEFT_IS[view];
  const far = near === "left" ? "right" : "left";
  return specs.flatMap((spec) => [
    { id: idFor(spec.id, near), view, label: labelFor(spec.label, near), side: near, region: spec.region, points: spec.half },
    { id: idFor(spec.id, far), view, label: labelFor(spec.label, far), side: far, region: spec.region, points: mirrorPolygon(spec.half) },
  ]);
}

/** Every zone of both views: the head and neck, then the client's left and right side of each part. */
export const ZONES: readonly Zone[] = VIEWS.flatMap((view) => [
  ...MIDLINE[view],
  ...lateralZones(view, view === "front" ? FRONT_LATERAL : BACK_LATERAL),
]);
