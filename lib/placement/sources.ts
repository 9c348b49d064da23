import { SOURCES } from "@/lib/stim";

const IEC = "IEC 60601-2-10:2012 (identical to EN 60601-2-10:2015)";

/** The sources the placement findings cite; one place, so the same source reads the same everywhere. */
export const PLACEMENT_SOURCES = {
  commonPractice: SOURCES.commonPractice,
  iecFrontNeck: `${IEC}: stimulation over the front of the neck (carotid sinus) is warned against`,
  iecHead: `${IEC}: stimulation across the head, over the eyes or over the mouth is warned against`,
  iecTransthoracic: `${IEC}: transthoracic stimulation is warned against`,
  iecTransthoracicReading:
    `${IEC}: transthoracic stimulation is warned against. Treating a current path from one side of the upper ` +
    "body to the other, or from the front of the chest to the back, as transthoracic is Rampline's reading " +
    "(no published source)",
  nearFrontNeck:
    `${IEC}: stimulation over the front of the neck is warned against. The 3 cm margin is Rampline's: about the ` +
    "radius of the common 2 in round electrode (common practice, no published source)",
  spacing:
    "Common practice (no published source): electrodes about 3 cm apart at least. The drawing's scale " +
    "(5 units per cm on an adult) is from memory, unverified",
} as const;

/** Closing sentence: the software points things out, the clinician decides. */
export const PLACEMENT_DEFER =
  "The treating clinician decides, following the stimulator manufacturer's instructions and local regulations.";

export const ELECTRODE_LETTERS = ["A", "B"] as const;
