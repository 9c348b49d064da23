import fc from "fast-check";
import type { ChannelSettings, Electrode, Waveform } from "@/lib/stim";

const num = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

export const arbElectrode: fc.Arbitrary<Electrode> = fc.oneof(
  fc.record({ shape: fc.constant("round" as const), diameter: num(1, 12), unit: fc.constant("cm" as const) }),
  fc.record({ shape: fc.constant("round" as const), diameter: num(0.5, 4), unit: fc.constant("in" as const) }),
  fc.record({ shape: fc.constant("square" as const), side: num(1, 12), unit: fc.constantFrom("cm" as const, "in" as const) }),
  fc.record({
    shape: fc.constant("rectangle" as const),
    width: num(1, 10),
    length: num(1, 15),
    unit: fc.constant("cm" as const),
  }),
);

export const arbWaveform: fc.Arbitrary<Waveform> = fc.oneof(
  fc.record({ kind: fc.constant("symmetric-biphasic" as const), interphaseGapUs: fc.option(num(0, 200), { nil: undefined }) }),
  fc.record({
    kind: fc.constant("asymmetric-balanced-biphasic" as const),
    secondPhaseAmplitudeMa: num(0.5, 100),
    secondPhaseDurationUs: num(20, 3000),
    interphaseGapUs: fc.option(num(0, 200), { nil: undefined }),
  }),
  fc.record({ kind: fc.constant("monophasic" as const) }),
);

/** Settings within the schema's limits, spread over what devices and programmes actually use and beyond. */
export const arbSettings: fc.Arbitrary<ChannelSettings> = fc.record({
  frequencyHz: num(0.5, 200),
  phaseDurationUs: num(20, 1000),
  waveform: arbWaveform,
  rampUpS: num(0, 5),
  holdS: num(0.5, 30),
  rampDownS: num(0, 5),
  restS: num(0, 60),
  amplitudeCeilingMa: num(1, 200),
  sessionMinutes: num(5, 120),
  sessionsPerDay: fc.integer({ min: 1, max: 3 }),
  daysPerWeek: fc.integer({ min: 1, max: 7 }),
  electrodes: fc.tuple(arbElectrode, arbElectrode),
  interElectrodeSpacingCm: fc.option(num(0, 20), { nil: undefined }),
  bodyRegion: fc.option(fc.constantFrom("hand-wrist", "forearm", "upper-arm", "shoulder", "other" as const), { nil: undefined }),
  earlyProgramme: fc.option(fc.boolean(), { nil: undefined }),
});

export const arbScale = num(0.01, 100);
