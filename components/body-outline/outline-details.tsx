import { mirrorPolygon, type Point, type View } from "@/lib/placement";

// A few quiet landmarks so the two views cannot be mistaken for each other: collarbones, navel and palm creases
// from the front; spine, shoulder blades and knuckles from behind. Drawn for the viewer's left half and mirrored.
const FRONT: readonly (readonly Point[])[] = [
  [[234, 178], [214, 176], [194, 174], [176, 179]], // collarbone
  [[121, 353], [130, 352], [136, 355]], // elbow crease
  [[85, 470], [97, 472], [108, 474]], // wrist crease
  [[87, 497], [82, 509], [74, 519], [66, 522]], // thenar crease
  [[71, 554], [66, 577]], // between the fingers
  [[80, 556], [75, 582]],
  [[89, 558], [85, 580]],
];

const BACK: readonly (readonly Point[])[] = [
  [[212, 214], [185, 209], [164, 206]], // spine of the shoulder blade
  [[212, 214], [207, 252], [200, 282], [193, 289], [184, 276], [172, 250], [165, 229]], // shoulder blade borders
  [[117, 350], [123, 356], [131, 357]], // point of the elbow
  [[66, 538], [72, 540]], // knuckles
  [[76, 540], [82, 542]],
  [[85, 542], [91, 544]],
  [[94, 543], [100, 544]],
  [[71, 554], [66, 577]], // between the fingers
  [[80, 556], [75, 582]],
  [[89, 558], [85, 580]],
];

const toPoints = (points: readonly Point[]) => points.map(([x, y]) => `${x},${y}`).join(" ");

export function OutlineDetails({ view }: { view: View }) {
  const half = view === "front" ? FRONT : BACK;
  const lines = [...half, ...half.map((line) => mirrorPolygon(line))];
  return (
    <g aria-hidden="true" className="pointer-events-none fill-none stroke-line" strokeWidth={1.5} strokeLinecap="round" strokeLinejoin="round">
      {lines.map((line, i) => (
        <polyline key={i} points={toPoints(line)} />
      ))}
      {view === "front" ? <circle cx={240} cy={402} r={2.5} /> : <line x1={240} y1={178} x2={240} y2={468} strokeDasharray="3 7" />}
    </g>
  );
}
