import { expect } from "vitest";
import { analyseChannel, type ChannelSettings, type Electrode, type Finding, type FindingCode } from "@/lib/stim";

/** The tolerance REFERENCES asks for on its check values. */
export const REL_TOL = 1e-3;

export function expectRelClose(actual: number | null | undefined, expected: number, tol = REL_TOL): void {
  expect(actual).toBeTypeOf("number");
  const a = actual as number;
  const scale = Math.max(Math.abs(expected), Number.MIN_VALUE);
  expect(Math.abs(a - expected) / scale, `${a} vs ${expected}`).toBeLessThanOrEqual(tol);
}

export const round = (diameter: number, unit: "cm" | "in" = "cm"): Electrode => ({ shape: "round", diameter, unit });
export const square = (side: number, unit: "cm" | "in" = "cm"): Electrode => ({ shape: "square", side, unit });

/**
 * Demo settings (invented, not a check value): a plausible forearm programme that raises no warning, so each
 * test changes only what it is about.
 */
export function demoChannel(overrides: Partial<ChannelSettings> = {}): ChannelSettings {
  return {
    frequencyHz: 35,
    phaseDurationUs: 300,
    waveform: { kind: "symmetric-biphasic" },
    rampUpS: 1,
    holdS: 5,
    rampDownS: 1,
    restS: 10,
    amplitudeCeilingMa: 40,
    sessionMinutes: 30,
    sessionsPerDay: 2,
    daysPerWeek: 5,
    electrodes: [round(2, "in"), round(2, "in")],
    bodyRegion: "forearm",
    ...overrides,
  };
}

export function findingCodes(input: unknown): string[] {
  return analyseChannel(input).findings.map((f) => f.code);
}

export function findingOf(input: unknown, code: FindingCode): Finding | undefined {
  return analyseChannel(input).findings.find((f) => f.code === code);
}

/** The demo channel with one field left out, as a form that was not filled in would send it. */
export function demoChannelWithout(key: keyof ChannelSettings): Record<string, unknown> {
  const settings: Record<string, unknown> = { ...demoChannel() };
  delete settings[key];
  return settings;
}
