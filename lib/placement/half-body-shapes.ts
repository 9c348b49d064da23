import type { Point } from "./types";

/*
 * Rampline's own outline, drawn for the viewer's LEFT half of the view box (x ≤ 240); the other half is its
 * mirror image. In the front view this half is the client's right side, in the back view the client's left.
 * Adult proportions at about 5 units per cm (see UNITS_PER_CM), the arms hanging about 11° out from the trunk,
 * palms forward (the anatomical position), so the front view shows the palms and the back view the backs of
 * the hands. Neighbouring shapes share their vertices exactly, so the zones tile the body without gaps; the
 * visible outline is the outer edge of their union.
 */

/** Half outlines from the midline round to the midline; completed by symmetricPolygon. */
export const HEAD_HALF: readonly Point[] = [
  [240, 30], [231, 32], [222, 37], [215, 46], [209, 57], [205, 70], [204, 84], [205, 98], [209, 111], [215, 122],
  [222, 131], [231, 136], [240, 138],
];
export const NECK_HALF: readonly Point[] = [
  [240, 138], [231, 136], [222, 131], [215, 122], [215, 140], [212, 152], [206, 160], [222, 167], [240, 172],
];

/** The shoulder cap as seen from the front or from behind: the deltoid, down to the level of the armpit. */
const SHOULDER: readonly Point[] = [
  [146, 188], [136, 192], [128, 199], [123, 209], [119, 221], [117, 233], [116, 245], [163, 254], [158, 228],
  [161, 205], [168, 177], [157, 182],
];
const UPPER_ARM: readonly Point[] = [
  [116, 245], [110, 274], [105, 304], [102, 329], [100, 349], [139, 356], [144, 337], [151, 313], [158, 284],
  [163, 254],
];
const FOREARM: readonly Point[] = [
  [100, 349], [95, 365], [91, 388], [88, 418], [85, 448], [82, 468], [111, 473], [116, 454], [124, 425], [132, 396],
  [137, 373], [139, 356],
];
const WRIST: readonly Point[] = [[82, 468], [78, 487], [90, 489], [99, 491], [107, 493], [111, 473]];

export const ARM = { shoulder: SHOULDER, upperArm: UPPER_ARM, forearm: FOREARM, wrist: WRIST } as const;

/** Palm side: the ball of the thumb with the thumb, the little-finger edge, and the rest of the palm and fingers. */
export const PALM_SIDE = {
  thenar: [
    [78, 487], [73, 497], [63, 505], [57, 513], [51, 523], [47, 530], [49, 535], [56, 533], [61, 528], [64, 525],
    [74, 519], [82, 509], [87, 497], [90, 489],
  ],
  palm: [
    [90, 489], [87, 497], [82, 509], [74, 519], [64, 525], [64, 535], [61, 552], [60, 568], [63, 577], [69, 582],
    [74, 584], [80, 584], [87, 582], [93, 575], [98, 559], [102, 543], [105, 535], [94, 533], [97, 516], [98, 502],
    [99, 491],
  ],
  hypothenar: [[99, 491], [98, 502], [97, 516], [94, 533], [105, 535], [109, 518], [109, 504], [107, 493]],
} as const satisfies Record<string, readonly Point[]>;

/** Back of the hand: the whole hand, thumb included (the same outline as the three palm-side shapes together). */
export const HAND_BACK: readonly Point[] = [
  [78, 487], [73, 497], [63, 505], [57, 513], [51, 523], [47, 530], [49, 535], [56, 533], [61, 528], [64, 525],
  [64, 535], [61, 552], [60, 568], [63, 577], [69, 582], [74, 584], [80, 584], [87, 582], [93, 575], [98, 559],
  [102, 543], [105, 535], [109, 518], [109, 504], [107, 493], [99, 491], [90, 489],
];

/** Front of the trunk: the chest down to the lowest ribs (collarbone and the top of the shoulder included). */
export const TRUNK_FRONT = {
  chest: [
    [240, 172], [222, 167], [206, 160], [196, 165], [183, 171], [168, 177], [161, 205], [158, 228], [163, 254],
    [164, 280], [165, 305], [167, 328], [185, 322], [205, 310], [225, 298], [240, 292],
  ],
  abdomen: [
    [240, 292], [225, 298], [205, 310], [185, 322], [167, 328], [170, 345], [172, 362], [172, 390], [168, 420],
    [162, 450], [158, 470], [180, 475], [210, 477], [240, 478],
  ],
} as const satisfies Record<string, readonly Point[]>;

/** Back of the trunk: above the spine of the shoulder blade, the shoulder blade, below it to the ribs, and below. */
export const TRUNK_BACK = {
  upperTrapezius: [
    [240, 172], [222, 167], [206, 160], [196, 165], [183, 171], [168, 177], [161, 205], [185, 209], [212, 214],
    [240, 216],
  ],
  scapula: [
    [240, 216], [212, 214], [185, 209], [161, 205], [158, 228], [163, 254], [164, 280], [164, 290], [200, 292],
    [240, 293],
  ],
  mid: [[240, 293], [200, 292], [164, 290], [165, 305], [167, 328], [170, 345], [200, 346], [240, 347]],
  lower: [
    [240, 347], [200, 346], [170, 345], [172, 362], [172, 390], [168, 420], [162, 450], [158, 470], [180, 475],
    [210, 477], [240, 478],
  ],
} as const satisfies Record<string, readonly Point[]>;
