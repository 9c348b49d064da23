/** Source strings the findings cite; kept in one place so the same source reads the same everywhere. */
export const SOURCES = {
  commonPractice: "Common practice (no published source)",
  arithmetic: "Standard circuit arithmetic (pulse period = 1 / frequency)",
  iecCurrentDensity:
    "IEC 60601-2-10:2012 (identical to EN 60601-2-10:2015), instructions for use: current densities above " +
    "2 mA/cm² may need special attention (read as r.m.s. by a secondary source)",
  fdaPowerDensity:
    "FDA powered muscle stimulator 510(k) guidance (1999), 0.25 W/cm² as given by a secondary summary",
  iecEnergyPerPulse:
    "Earlier edition of IEC 60601-2-10: 300 mJ per pulse into 500 Ω (secondary source)",
  netCharge:
    "US 21 CFR 882.5888 special controls (net charge per pulse is a declared output); skin effect: " +
    "common practice (no published source)",
  smoothFrequencyBand:
    "Common practice (no published source); 20–50 Hz for a sustained contraction also in Doucet, Lam & " +
    "Griffin (2012), Yale J Biol Med 85:201–215",
  usualPulseDurationBand:
    "Common practice (no published source); 250 µs also the most common setting in Ito et al. (2023), " +
    "NeuroRehabilitation, scoping review of hemiplegic-shoulder stimulation",
} as const;

/** Closing sentence for findings about how to stimulate: the software informs, the clinician decides. */
export const DEFER =
  "The treating clinician decides, following the stimulator manufacturer's instructions.";
