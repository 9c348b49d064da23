import { deriveChannel, type ChannelDerived } from "./derive";
import { bandFindings } from "./findings/bands";
import { netChargeFindings } from "./findings/charge";
import { densityFindings } from "./findings/density";
import { findingsFromIssues } from "./findings/input";
import { placementFindings } from "./findings/placement";
import { programmeFindings } from "./findings/programme";
import { cycleFindings, pulseTimingFindings } from "./findings/timing";
import { sortFindings, type Finding } from "./findings/types";
import { parseChannelSettings, type FieldErrors } from "./parse";
import { channelSettingsSchema, type ChannelSettings } from "./schema";

export interface ChannelAnalysis {
  /** True when the settings parsed and no finding blocks publishing. */
  ok: boolean;
  /** Present when the input parsed. */
  settings?: ChannelSettings;
  /** Present when the input parsed; figures are not meaningful while a "blocks" finding stands. */
  derived?: ChannelDerived;
  /** Sorted blocks → warning → note. */
  findings: Finding[];
  /** Field path → message; empty when the input parsed. */
  fieldErrors: FieldErrors;
}

// Sections whose blocking checks need only their own fields, so they still run when another field is bad.
const pulseSection = channelSettingsSchema.pick({ frequencyHz: true, phaseDurationUs: true, waveform: true });
const cycleSection = channelSettingsSchema.pick({ rampUpS: true, holdS: true, rampDownS: true, restS: true });

function partialBlocks(input: unknown): Finding[] {
  const out: Finding[] = [];
  const pulse = pulseSection.safeParse(input);
  if (pulse.success) out.push(...pulseTimingFindings(pulse.data));
  const cycle = cycleSection.safeParse(input);
  if (cycle.success) out.push(...cycleFindings(cycle.data));
  return out.filter((f) => f.severity === "blocks");
}

/** Every finding for parsed settings and their derived figures, sorted. */
export function findingsForChannel(settings: ChannelSettings, derived: ChannelDerived): Finding[] {
  return sortFindings([
    ...pulseTimingFindings(settings),
    ...cycleFindings(settings),
    ...densityFindings(settings, derived),
    ...netChargeFindings(settings, derived),
    ...placementFindings(settings, derived),
    ...programmeFindings(settings, derived),
    ...bandFindings(settings),
  ]);
}

/**
 * The single entry point. Takes raw input (a form's values, a request body) and never throws: invalid
 * fields become "blocks" findings alongside any pulse or cycle block that the valid fields already show.
 */
export function analyseChannel(input: unknown): ChannelAnalysis {
  const parsed = parseChannelSettings(input);
  if (!parsed.success) {
    const findings = sortFindings([...findingsFromIssues(parsed.issues), ...partialBlocks(input)]);
    return { ok: false, findings, fieldErrors: parsed.fieldErrors };
  }
  const derived = deriveChannel(parsed.data);
  const findings = findingsForChannel(parsed.data, derived);
  return {
    ok: !findings.some((f) => f.severity === "blocks"),
    settings: parsed.data,
    derived,
    findings,
    fieldErrors: {},
  };
}
