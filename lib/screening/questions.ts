// The wording of the screening: ids that are stored (never change them), and the labels the screens show. Kept in
// one place so the form, the summaries, the gate's reasons and the tests all say the same thing.
//
// The structure follows the screening checklist in REFERENCES.md, which is synthesised from Houghton et al. (2010)
// and Nussbaum et al. (2017) and from memory where neither is cited.

export const YES_NO = ["yes", "no"] as const;
export type YesNo = (typeof YES_NO)[number];

// Systemic red flags: each one blocks publishing until a named clinician's clearance is recorded.
export const RED_FLAGS = [
  {
    id: "active-implant",
    key: "activeImplant",
    label: "Pacemaker, defibrillator or other active implant",
    question: "Does the client have a pacemaker, an implanted defibrillator or another active implant (for example a nerve stimulator or a drug pump)?",
  },
  {
    id: "uncontrolled-epilepsy",
    key: "uncontrolledEpilepsy",
    label: "Uncontrolled epilepsy",
    question: "Does the client have epilepsy that is not controlled?",
  },
  { id: "pregnancy", key: "pregnancy", label: "Pregnancy", question: "Is the client pregnant, or could they be?" },
  {
    id: "unstable-heart-disease",
    key: "unstableHeartDisease",
    label: "Unstable heart disease",
    question: "Does the client have unstable heart disease (for example an uncontrolled arrhythmia or unstable angina)?",
  },
  {
    id: "no-reliable-feedback",
    key: "noReliableFeedback",
    label: "Cannot give reliable feedback and no capable carer",
    question: "Is the client unable to tell you reliably what they feel, with no capable carer to do it for them?",
  },
] as const;

export type RedFlag = (typeof RED_FLAGS)[number];
export type RedFlagId = RedFlag["id"];
export type RedFlagKey = RedFlag["key"];
export const RED_FLAG_IDS = RED_FLAGS.map((flag) => flag.id) as [RedFlagId, ...RedFlagId[]];

export function redFlagLabel(id: string): string {
  return RED_FLAGS.find((flag) => flag.id === id)?.label ?? id;
}

type Options<T extends string> = Record<T, string>;

export const AFFECTED_SIDES = ["left", "right", "both"] as const;
export const SIDE_LABELS: Options<(typeof AFFECTED_SIDES)[number]> = { left: "Left", right: "Right", both: "Both sides" };

export const APPLIERS = ["client", "carer", "both"] as const;
export const APPLIER_LABELS: Options<(typeof APPLIERS)[number]> = {
  client: "The client",
  carer: "A carer",
  both: "The client and a carer",
};

export const SENSATION_METHODS = ["light-touch", "sharp-blunt", "hot-cold", "monofilament", "other"] as const;
export const SENSATION_METHOD_LABELS: Options<(typeof SENSATION_METHODS)[number]> = {
  "light-touch": "Light touch",
  "sharp-blunt": "Sharp and blunt",
  "hot-cold": "Hot and cold",
  monofilament: "Monofilament",
  other: "Another method (say which in the notes)",
};

export const SENSATION_RESULTS = ["intact", "reduced", "absent"] as const;
export const SENSATION_RESULT_LABELS: Options<(typeof SENSATION_RESULTS)[number]> = {
  intact: "Intact",
  reduced: "Reduced",
  absent: "Absent",
};

export const CARER_COMPETENCE = ["competent", "not-yet", "no-carer"] as const;
export const CARER_COMPETENCE_LABELS: Options<(typeof CARER_COMPETENCE)[number]> = {
  competent: "A carer can apply and remove the electrodes safely",
  "not-yet": "A carer is involved but cannot do this safely yet",
  "no-carer": "No carer is involved",
};

export const TOLERANCE = ["comfortable", "tolerable", "not-tolerated"] as const;
export const TOLERANCE_LABELS: Options<(typeof TOLERANCE)[number]> = {
  comfortable: "Comfortable",
  tolerable: "Tolerable, with some discomfort",
  "not-tolerated": "Not tolerated",
};

export const MOVEMENT = ["clear", "contraction-only", "none"] as const;
export const MOVEMENT_LABELS: Options<(typeof MOVEMENT)[number]> = {
  clear: "Clear movement in the intended direction",
  "contraction-only": "A visible contraction with little or no movement",
  none: "No visible contraction",
};

export const SKIN_AFTER = ["no-change", "faint-pink", "redness-beyond", "damage"] as const;
export const SKIN_AFTER_LABELS: Options<(typeof SKIN_AFTER)[number]> = {
  "no-change": "No change",
  "faint-pink": "Faint pinkness within the electrode outline",
  "redness-beyond": "Redness beyond the outline, raised or itchy skin",
  damage: "Blistering, broken skin or a burn",
};

export const OUTCOMES = ["eligible", "eligible-with-precautions", "not-eligible"] as const;
export type Outcome = (typeof OUTCOMES)[number];
export const OUTCOME_LABELS: Options<Outcome> = {
  eligible: "Eligible",
  "eligible-with-precautions": "Eligible with precautions",
  "not-eligible": "Not eligible",
};

export const MAX_SITES = 8;
