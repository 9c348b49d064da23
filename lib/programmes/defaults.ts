// Rampline's default steps and cautions, from the trade's usual practice (no published source). The therapist can
// edit the steps; the standard cautions are always shown, and the therapist adds their own below them.

export const DEFAULT_SKIN_PREPARATION = [
  "Wash the skin where the electrodes go with soap and water, rinse and dry it well. No creams, oils or lotions.",
  "If there is hair, clip it short with scissors. Do not shave: shaving can nick the skin.",
  "Check the skin first: do not place electrodes on broken, red, inflamed or numb skin, or on a rash.",
  "Place each electrode as in the photo and drawing, then smooth it flat from the middle out so no edge lifts.",
  "Keep the electrodes at least three finger-widths (about 3 cm) apart.",
];

export const DEFAULT_ELECTRODE_CARE = [
  "Turn the stimulator off before you take the electrodes off.",
  "Peel each electrode off from a corner. Never pull it off by the lead.",
  "Put a small dab of water on the gel if it feels dry, then press it back on its backing sheet.",
  "Keep the electrodes sealed in their bag, at room temperature: not in the fridge, not near heat.",
  "Do not wash them with soap or alcohol. Replace them when they stop sticking or an edge keeps lifting.",
  "Look at your skin after each session. A faint pinkness under the electrodes that fades within an hour is common.",
];

// Shown on every programme and handout, whatever the settings.
export const STANDARD_CAUTIONS = [
  "Never place electrodes on the front or sides of the neck, across the chest, on the head, or over the eyes or mouth.",
  "Never place electrodes on broken, inflamed, infected or numb skin, or over a rash.",
  "Start with the amplitude at zero and turn it up slowly, only as far as your therapist showed you.",
  "Stop at once if you feel pain or burning, and check your skin. Do not carry on if the skin is blistered or broken.",
  "Do not use the stimulator while driving, operating machinery, in the bath or shower, or while asleep.",
  "Follow your stimulator's instructions from its manufacturer. If anything here disagrees with them, ask your therapist.",
  "If you have new redness that lasts, itching, bumps, blisters or a burn mark, stop using that site and contact your clinic.",
];

export const TARGET_SUGGESTIONS = [
  "Wrist and finger extensors",
  "Wrist and finger flexors",
  "Thumb abduction (abductor pollicis brevis)",
  "Elbow extension (triceps)",
  "Elbow flexion (biceps)",
  "Shoulder support (supraspinatus and posterior deltoid)",
  "Shoulder flexion (anterior deltoid)",
  "Forearm supination",
];
