/**
 * Frequency and pulse-duration bands from the trade's rules of thumb (common practice, no published source).
 * Each band runs up to and including `upTo` unless `upToExclusive`; the first band that fits wins, so the
 * lower boundary of a band is the upper boundary of the one before it.
 */
export interface Band<Id extends string> {
  id: Id;
  upTo: number;
  upToExclusive?: boolean;
  label: string;
  effect: string;
}

export type FrequencyBandId =
  | "twitch"
  | "partial-fusion"
  | "smooth-comfortable"
  | "smooth-strong"
  | "above-usual"
  | "sensory";

export const FREQUENCY_BANDS: readonly Band<FrequencyBandId>[] = [
  { id: "twitch", upTo: 10, label: "Separate twitches (up to about 10 Hz)",
    effect: "Each pulse gives a separate twitch; used for sensory work and pain relief rather than a sustained contraction." },
  { id: "partial-fusion", upTo: 20, upToExclusive: true, label: "Between twitches and a smooth contraction (above 10, below 20 Hz)",
    effect: "The twitches begin to merge, but the contraction is not yet fully smooth." },
  { id: "smooth-comfortable", upTo: 35, label: "Smooth contraction, more comfortable (20–35 Hz)",
    effect: "A smooth, sustained contraction in the usual range for strengthening after neurological injury; more comfortable and slower to fatigue than higher frequencies." },
  { id: "smooth-strong", upTo: 60, label: "Smooth, stronger contraction (above 35, up to about 60 Hz)",
    effect: "Still within the usual range for a sustained contraction (20–50 Hz, at most about 60); stronger than at 20–35 Hz but less comfortable and quicker to fatigue." },
  { id: "above-usual", upTo: 100, label: "Above the usual range (above 60, up to about 100 Hz)",
    effect: "A stronger contraction that is less comfortable and fatigues sooner." },
  { id: "sensory", upTo: Infinity, label: "Mainly sensory (above about 100 Hz)",
    effect: "Above about 100 Hz the effect is mainly sensory rather than a useful contraction." },
];

export type PulseDurationBandId = "very-short" | "short" | "intermediate" | "usual" | "long";

/** Judged on the (first) phase duration, which is what devices and the rules of thumb call pulse duration. */
export const PULSE_DURATION_BANDS: readonly Band<PulseDurationBandId>[] = [
  { id: "very-short", upTo: 50, upToExclusive: true, label: "Very short (below 50 µs)",
    effect: "Shorter than the range the rules of thumb describe; a contraction may need a high amplitude." },
  { id: "short", upTo: 100, label: "Short (about 50–100 µs)",
    effect: "Usually more comfortable; the contraction fatigues sooner." },
  { id: "intermediate", upTo: 250, upToExclusive: true, label: "Between short and usual (above 100, below 250 µs)",
    effect: "Between the short durations chosen for comfort and the usual range for strengthening." },
  { id: "usual", upTo: 300, label: "Usual for strengthening (about 250–300 µs)",
    effect: "The usual range for strengthening after neurological injury." },
  { id: "long", upTo: Infinity, label: "Long (above 300 µs)",
    effect: "A stronger contraction with less comfort and a risk of overflow into neighbouring muscles, above all around the hand and wrist." },
];

function classify<Id extends string>(bands: readonly Band<Id>[], value: number): Band<Id> {
  const band = bands.find((b) => (b.upToExclusive ? value < b.upTo : value <= b.upTo));
  // The last band is unbounded, so a finite value always lands in one; NaN falls through to it too.
  return band ?? (bands[bands.length - 1] as Band<Id>);
}

export const frequencyBand = (frequencyHz: number): Band<FrequencyBandId> => classify(FREQUENCY_BANDS, frequencyHz);

export const pulseDurationBand = (phaseDurationUs: number): Band<PulseDurationBandId> =>
  classify(PULSE_DURATION_BANDS, phaseDurationUs);
