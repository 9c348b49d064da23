// The five-level skin scale clients use after a session, in plain words, and how each level reads on the ICDRG
// patch-test reading scale for the therapist. The scale's wording and the mapping are Rampline's own (common
// practice, no published source); the ICDRG grades themselves are as REFERENCES gives them.
export type SkinLevel = 1 | 2 | 3 | 4 | 5;

export const SKIN_SCALE: Record<SkinLevel, { words: string; hint: string; icdrg: string }> = {
  1: { words: "No change", hint: "The skin looks as it did before.", icdrg: "− negative" },
  2: { words: "Faint pink that fades within an hour", hint: "Only under the electrode, gone within the hour.", icdrg: "?+ doubtful (faint erythema only)" },
  3: { words: "Red for longer, or still there next time", hint: "Redness that lasts more than an hour or is back before the next session.", icdrg: "+ weak (erythema, infiltration, possibly papules)" },
  4: { words: "Itchy bumps or a rash", hint: "Raised spots, bumps or a rash, often itchy.", icdrg: "++ strong (papules, vesicles)" },
  5: { words: "Blisters, broken skin or a burn mark", hint: "Any blister, break in the skin, or a mark like a burn.", icdrg: "+++ extreme (coalescing vesicles, bullae); a burn is an injury, not an allergy reading" },
};

export const SKIN_LEVELS: SkinLevel[] = [1, 2, 3, 4, 5];

// Spreading beyond the electrode's outline and itch point towards an allergy rather than irritation.
export function icdrgReading(level: SkinLevel, spreads: boolean, itch: boolean): string {
  const base = SKIN_SCALE[level].icdrg;
  if (level >= 2 && (spreads || itch)) return `${base}; ${[spreads ? "spreads beyond the electrode" : "", itch ? "itchy" : ""].filter(Boolean).join(", ")}: consider an allergic reaction (IR irritant otherwise)`;
  return base;
}
