import { describe, expect, it } from "vitest";
import { frequencyBand, pulseDurationBand } from "@/lib/stim";
import { demoChannel, findingCodes, findingOf } from "./helpers";

describe("frequency-band (note)", () => {
  it.each([
    // common practice (no published source): about 1–10 Hz gives separate twitches
    [5, "twitch"],
    [10, "twitch"],
    // common practice (no published source): between the twitch and smooth ranges
    [15, "partial-fusion"],
    // common practice (no published source): 20–35 Hz smooth, more comfortable, slower to fatigue
    [20, "smooth-comfortable"],
    [35, "smooth-comfortable"],
    // common practice (no published source): smooth up to about 60 Hz, stronger and quicker to fatigue
    [36, "smooth-strong"],
    [60, "smooth-strong"],
    // common practice (no published source): higher is stronger, less comfortable, fatigues sooner
    [80, "above-usual"],
    [100, "above-usual"],
    // common practice (no published source): above about 100 Hz mainly sensory
    [150, "sensory"],
  ] as const)("%d Hz falls in the %s band", (hz, band) => {
    expect(frequencyBand(hz).id).toBe(band);
  });

  it("places 20–50 Hz in a smooth-contraction band", () => {
    // source: Doucet, Lam & Griffin (2012), Yale J Biol Med 85:201–215: NMES typically 20–50 Hz for tetanic contraction
    for (const hz of [20, 30, 40, 50]) expect(frequencyBand(hz).id).toMatch(/^smooth-/);
  });

  it("treats 30 Hz, the most common setting for the hemiplegic shoulder, as usual", () => {
    // source: Ito et al. (2023), NeuroRehabilitation, scoping review: most common 30 Hz
    expect(frequencyBand(30).id).toBe("smooth-comfortable");
  });

  it("produces one note naming the band, and none when the input does not parse", () => {
    const f = findingOf(demoChannel({ frequencyHz: 5 }), "frequency-band");
    // common practice (no published source): about 1–10 Hz gives separate twitches
    expect(f?.severity).toBe("note");
    expect(f?.title).toMatch(/twitches/i);
    expect(f?.title).not.toMatch(/smooth/i);
    expect(findingCodes(demoChannel({ frequencyHz: 0 }))).not.toContain("frequency-band");
  });
});

describe("pulse-duration-band (note)", () => {
  it.each([
    // common practice (no published source): short is about 50–100 µs
    [40, "very-short"],
    [50, "short"],
    [100, "short"],
    [150, "intermediate"],
    // common practice (no published source): about 250–300 µs is usual after neurological injury
    [250, "usual"],
    [300, "usual"],
    // common practice (no published source): longer gives overflow risk, above all at the hand and wrist
    [400, "long"],
  ] as const)("%d µs falls in the %s band", (us, band) => {
    expect(pulseDurationBand(us).id).toBe(band);
  });

  it("treats 250 µs, the most common setting for the hemiplegic shoulder, as usual", () => {
    // source: Ito et al. (2023), NeuroRehabilitation, scoping review: most common 250 µs
    expect(pulseDurationBand(250).id).toBe("usual");
  });

  it("produces one note naming the band, and none when the input does not parse", () => {
    const f = findingOf(demoChannel({ phaseDurationUs: 400 }), "pulse-duration-band");
    // common practice (no published source): longer pulses risk overflow into neighbouring muscles
    expect(f?.title).toMatch(/long/i);
    expect(f?.explanation).toMatch(/overflow/);
    expect(findingCodes(demoChannel({ phaseDurationUs: -1 }))).not.toContain("pulse-duration-band");
  });
});
