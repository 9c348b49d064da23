import { describe, expect, it } from "vitest";
import { EXAMPLE_VALUES, toChannelInput, toNumber, unplacedErrors, type SettingsFormValues } from "@/lib/forms/channel-settings-values";
import { analyseChannel } from "@/lib/stim";

const withValues = (patch: Partial<SettingsFormValues>): SettingsFormValues => ({ ...EXAMPLE_VALUES, ...patch });

describe("the explorer's form values", () => {
  it("reads blank boxes as not entered and leaves text that is not a number as typed", () => {
    expect(toNumber("35")).toBe(35);
    expect(toNumber(" 2.5 ")).toBe(2.5);
    expect(toNumber("")).toBeUndefined();
    expect(toNumber("   ")).toBeUndefined();
    expect(toNumber("thirty")).toBe("thirty");
  });

  it("makes an example that parses with no warning or block", () => {
    const analysis = analyseChannel(toChannelInput(EXAMPLE_VALUES));
    expect(analysis.ok).toBe(true);
    expect(analysis.findings.filter((f) => f.severity !== "note")).toEqual([]);
  });

  it("sends only the size fields of the chosen shape, and leaves optional blanks out", () => {
    const rect = { shape: "rectangle" as const, diameter: "9", side: "9", width: "5", length: "9", unit: "cm" as const };
    const input = toChannelInput(withValues({ electrodes: [rect, EXAMPLE_VALUES.electrodes[1]] }));
    expect((input.electrodes as unknown[])[0]).toEqual({ shape: "rectangle", width: 5, length: 9, unit: "cm" });
    expect(input.interElectrodeSpacingCm).toBeUndefined();
    expect((input.waveform as Record<string, unknown>).interphaseGapUs).toBeUndefined();
    expect(toChannelInput(withValues({ bodyRegion: "" })).bodyRegion).toBeUndefined();
  });

  it("sends the second phase only for the asymmetric waveform", () => {
    const asym = toChannelInput(withValues({ waveform: { ...EXAMPLE_VALUES.waveform, kind: "asymmetric-balanced-biphasic" } }));
    expect(asym.waveform).toEqual({ kind: "asymmetric-balanced-biphasic", secondPhaseAmplitudeMa: 10, secondPhaseDurationUs: 1200, interphaseGapUs: undefined });
    expect(toChannelInput(withValues({ waveform: { ...EXAMPLE_VALUES.waveform, kind: "monophasic" } })).waveform).toEqual({ kind: "monophasic" });
  });

  it("gets a message on the field for a blank or wrong box, which the form shows in place", () => {
    const values = withValues({ frequencyHz: "", restS: "-1" });
    const { fieldErrors } = analyseChannel(toChannelInput(values));
    expect(Object.keys(fieldErrors).sort()).toEqual(["frequencyHz", "restS"]);
    expect(unplacedErrors(fieldErrors, values)).toEqual([]);
    expect(unplacedErrors({ _root: "Not an object." }, values)).toEqual(["Not an object."]);
  });
});
