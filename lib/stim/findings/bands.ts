import { frequencyBand, pulseDurationBand } from "../bands";
import type { ChannelSettings } from "../schema";
import { fmt } from "./format";
import { DEFER, SOURCES } from "./sources";
import type { Finding } from "./types";

/** Always two notes: where the frequency and the phase duration sit, with their usual effects. */
export function bandFindings(s: ChannelSettings): Finding[] {
  const f = frequencyBand(s.frequencyHz);
  const t = pulseDurationBand(s.phaseDurationUs);
  return [
    {
      code: "frequency-band",
      severity: "note",
      title: `Frequency: ${f.label}`,
      explanation: `The frequency is ${fmt(s.frequencyHz, 2)} Hz. ${f.effect} ${DEFER}`,
      source: f.id.startsWith("smooth-") ? SOURCES.smoothFrequencyBand : SOURCES.commonPractice,
      numbers: { frequencyHz: s.frequencyHz },
    },
    {
      code: "pulse-duration-band",
      severity: "note",
      title: `Pulse duration: ${t.label}`,
      explanation: `Each phase lasts ${fmt(s.phaseDurationUs)} µs. ${t.effect} ${DEFER}`,
      source: t.id === "usual" ? SOURCES.usualPulseDurationBand : SOURCES.commonPractice,
      numbers: { phaseDurationUs: s.phaseDurationUs },
    },
  ];
}
