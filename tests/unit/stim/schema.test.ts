import { describe, expect, it } from "vitest";
import { ROOT_FIELD, parseChannelSettings } from "@/lib/stim";
import { demoChannel, demoChannelWithout, round } from "./helpers";

function errorsFor(input: unknown): Record<string, string> {
  const r = parseChannelSettings(input);
  if (r.success) throw new Error("expected the input to be rejected");
  return r.fieldErrors;
}

describe("channel settings schema", () => {
  it("accepts the demo channel and each waveform", () => {
    expect(parseChannelSettings(demoChannel()).success).toBe(true);
    expect(parseChannelSettings(demoChannel({ waveform: { kind: "monophasic" } })).success).toBe(true);
    const asym = { kind: "asymmetric-balanced-biphasic", secondPhaseAmplitudeMa: 10, secondPhaseDurationUs: 1200, interphaseGapUs: 50 } as const;
    expect(parseChannelSettings(demoChannel({ waveform: asym })).success).toBe(true);
  });

  it("names the field and its unit for missing, non-numeric and non-positive values", () => {
    expect(errorsFor(demoChannelWithout("frequencyHz")).frequencyHz).toBe("Enter the frequency (Hz).");
    expect(errorsFor({ ...demoChannel(), frequencyHz: "35" }).frequencyHz).toBe("The frequency must be a number in Hz.");
    expect(errorsFor(demoChannel({ phaseDurationUs: 0 })).phaseDurationUs).toBe("The phase duration must be more than 0 µs.");
    expect(errorsFor(demoChannel({ amplitudeCeilingMa: -5 })).amplitudeCeilingMa).toBe(
      "The amplitude ceiling must be more than 0 mA.",
    );
    expect(errorsFor(demoChannel({ restS: -1 })).restS).toBe("The rest time cannot be negative.");
  });

  it("rejects NaN and infinite numbers", () => {
    expect(errorsFor(demoChannel({ holdS: Number.NaN })).holdS).toMatch(/hold time must be a number/);
    expect(errorsFor(demoChannel({ frequencyHz: Infinity })).frequencyHz).toMatch(/frequency must be a number/);
  });

  it("gives upper bounds with British number formatting", () => {
    expect(errorsFor(demoChannel({ frequencyHz: 20_000 })).frequencyHz).toBe("The frequency must be 10,000 Hz or less.");
    expect(errorsFor(demoChannel({ sessionMinutes: 300 })).sessionMinutes).toMatch(/240 minutes or less/);
  });

  it("wants whole numbers of sessions and days", () => {
    expect(errorsFor(demoChannel({ sessionsPerDay: 1.5 })).sessionsPerDay).toBe(
      "The number of sessions per day must be a whole number from 1 to 12.",
    );
    expect(errorsFor(demoChannel({ daysPerWeek: 8 })).daysPerWeek).toMatch(/whole number from 1 to 7/);
    expect(errorsFor(demoChannel({ daysPerWeek: 0 })).daysPerWeek).toMatch(/whole number from 1 to 7/);
  });

  it("reports electrode problems at the electrode's own field", () => {
    expect(errorsFor(demoChannel({ electrodes: [round(0), round(5)] }))["electrodes.0.diameter"]).toBe(
      "The electrode's diameter must be more than 0.",
    );
    expect(errorsFor({ ...demoChannel(), electrodes: [round(5), { shape: "triangle", side: 3, unit: "cm" }] })).toHaveProperty(
      "electrodes.1.shape",
      "Choose the electrode's shape: round, square or rectangle.",
    );
    expect(errorsFor({ ...demoChannel(), electrodes: [round(5), { shape: "square", side: 3, unit: "mm" }] })["electrodes.1.unit"]).toBe(
      "Choose the unit of the electrode size: cm or in.",
    );
    expect(errorsFor({ ...demoChannel(), electrodes: [round(5)] }).electrodes).toBe("A channel needs exactly two electrodes.");
  });

  it("bounds electrode size in centimetres whichever unit is typed", () => {
    // 20 in is 50.8 cm, just over the 50 cm bound; 19 in (48.26 cm) is within it.
    expect(errorsFor(demoChannel({ electrodes: [round(20, "in"), round(5)] }))["electrodes.0.diameter"]).toMatch(/50 cm/);
    expect(parseChannelSettings(demoChannel({ electrodes: [round(19, "in"), round(5)] })).success).toBe(true);
    expect(errorsFor(demoChannel({ electrodes: [round(5), { shape: "rectangle", width: 5, length: 60, unit: "cm" }] }))).toHaveProperty(
      "electrodes.1.length",
    );
  });

  it("checks the waveform's own fields", () => {
    const missing = errorsFor({ ...demoChannel(), waveform: { kind: "asymmetric-balanced-biphasic", secondPhaseDurationUs: 900 } });
    expect(missing["waveform.secondPhaseAmplitudeMa"]).toBe("Enter the second phase's amplitude (mA).");
    const unknown = errorsFor({ ...demoChannel(), waveform: { kind: "sawtooth" } });
    expect(Object.values(unknown).join(" ")).toMatch(/Choose a waveform/);
    expect(errorsFor(demoChannel({ waveform: { kind: "symmetric-biphasic", interphaseGapUs: -10 } }))["waveform.interphaseGapUs"]).toBe(
      "The interphase gap cannot be negative.",
    );
  });

  it("checks the optional fields only when given", () => {
    expect(errorsFor({ ...demoChannel(), bodyRegion: "neck" }).bodyRegion).toMatch(/Choose the body region/);
    expect(errorsFor(demoChannel({ interElectrodeSpacingCm: -2 })).interElectrodeSpacingCm).toMatch(/cannot be negative/);
    expect(errorsFor({ ...demoChannel(), earlyProgramme: "yes" }).earlyProgramme).toMatch(/early in the programme/);
  });

  it("reports every bad field at once, one message each", () => {
    const errors = errorsFor(demoChannel({ frequencyHz: 0, holdS: -1, sessionsPerDay: 0 }));
    expect(Object.keys(errors).sort()).toEqual(["frequencyHz", "holdS", "sessionsPerDay"]);
  });

  it("puts a problem with the whole input under the root key", () => {
    expect(errorsFor("not settings")[ROOT_FIELD]).toMatch(/settings are missing/);
    expect(errorsFor(null)[ROOT_FIELD]).toMatch(/settings are missing/);
  });

  it("lets settings through that only the findings can judge", () => {
    // 1,000 Hz leaves 1,000 µs per pulse; two 600 µs phases overrun it, which is the "pulses-overlap" finding's job.
    expect(parseChannelSettings(demoChannel({ frequencyHz: 1000, phaseDurationUs: 600 })).success).toBe(true);
    expect(parseChannelSettings(demoChannel({ rampUpS: 2, holdS: 0, rampDownS: 2 })).success).toBe(true);
  });
});
