// Where each screening rule comes from, shown beside the concern it raises and cited again in the tests.
// The checklist itself is synthesised from Houghton et al. (2010) and Nussbaum et al. (2017), from memory where
// neither is cited: rules that lean on those papers say "as recalled" because the tables were not re-checked.
export const SCREENING_SOURCES = {
  checklist:
    "Screening checklist in REFERENCES.md, synthesised from Houghton et al. (2010), Physiotherapy Canada 62(5), and Nussbaum et al. (2017), Physiotherapy Canada 69(5); from memory where not cited",
  iecNeckChest:
    "IEC 60601-2-10:2012 (= BS EN 60601-2-10:2015): stimulation over the front of the neck (carotid sinus) or across the chest is warned against",
  houghtonRecalled: "Houghton et al. (2010), Physiotherapy Canada 62(5), as recalled (from memory, unverified)",
  skinRuleOfThumb:
    "Rule of thumb in REFERENCES.md: faint pinkness within the outline that fades is usually normal; spreading or lasting redness, blisters or broken skin need the therapist (from memory, unverified)",
  commonPractice: "Common practice (no published source)",
} as const;
