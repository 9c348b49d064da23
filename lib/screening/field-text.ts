// How each answer is asked on the form (`ask`) and shown in a signed version (`show`), kept together so the two
// never drift apart. Red-flag questions live with the flags in questions.ts.
type Text = { ask: string; show: string; hint?: string };

export const CONTEXT_TEXT = {
  diagnosis: { ask: "Diagnosis", show: "Diagnosis", hint: "For example: stroke, left hemisphere; incomplete spinal cord injury at C6." },
  affectedSide: { ask: "Which side is affected?", show: "Affected side" },
  onset: { ask: "When did it start?", show: "Onset", hint: "Give the date if you know it; otherwise the time since onset." },
  onsetDate: { ask: "Onset date", show: "Onset date" },
  timeSince: { ask: "Time since onset", show: "Time since onset", hint: "For example: about 8 months." },
  appliedBy: { ask: "Who will apply the electrodes at home?", show: "Applies the electrodes at home" },
  carerPresent: { ask: "Was a carer present at this screening?", show: "Carer present at this screening" },
} satisfies Record<string, Text>;

export const SITE_TEXT = {
  name: { ask: "Site name", show: "Site", hint: "The muscle or movement and the side, for example: right wrist and finger extensors." },
  skinIntact: { ask: "Is the skin at this site intact?", show: "Skin intact" },
  sensationMethod: { ask: "How did you test sensation?", show: "Sensation tested by" },
  sensationResult: { ask: "What did the sensation test show?", show: "Sensation" },
  clotHistory: { ask: "Has the client had a blood clot in this limb?", show: "History of a blood clot in this limb" },
  malignancyOrRadiotherapy: { ask: "Is there a malignancy, or has there been radiotherapy, in this region?", show: "Malignancy or radiotherapy in this region" },
  recentFractureOrSurgery: { ask: "Has there been a recent fracture or surgery here?", show: "Recent fracture or surgery here" },
  swelling: { ask: "Is this area swollen?", show: "Swelling" },
  metalwork: { ask: "Is there metalwork (a plate, screws, a joint replacement) under or near this site?", show: "Metalwork under or near the site" },
  clearOfNeckAndChest: { ask: "Is this site, and the current path between its electrodes, well clear of the front of the neck and the chest?", show: "Well clear of the front of the neck and the chest" },
  notes: { ask: "Notes for this site (optional)", show: "Notes" },
} satisfies Record<string, Text>;

export const CAPACITY_TEXT = {
  understanding: { ask: "Does the client understand how to use the stimulator safely and when to stop?", show: "Understands safe use and when to stop" },
  dexterity: { ask: "Does the client have the dexterity to apply and remove the electrodes?", show: "Dexterity to apply and remove the electrodes" },
  carerCompetence: { ask: "Which best describes the carer?", show: "Carer" },
} satisfies Record<string, Text>;

export const TEST_TEXT = {
  done: { ask: "Was a test stimulation done in clinic?", show: "Test stimulation in clinic" },
  tolerance: { ask: "How well was it tolerated?", show: "Tolerance" },
  movement: { ask: "What movement did it produce?", show: "Movement produced" },
  skinAfter: { ask: "How did the skin look 10–20 minutes afterwards?", show: "Skin 10–20 minutes afterwards" },
  notDoneReason: { ask: "Why was no test stimulation done?", show: "Why no test stimulation" },
} satisfies Record<string, Text>;

export const OUTCOME_TEXT = {
  result: { ask: "Outcome of this screening", show: "Outcome" },
  rescreenOn: { ask: "Screen again by", show: "Screen again by", hint: "Optional when the client is not eligible." },
  notes: { ask: "Precautions or reasons", show: "Precautions or reasons", hint: "Needed for “eligible with precautions” and “not eligible”." },
} satisfies Record<string, Text>;
