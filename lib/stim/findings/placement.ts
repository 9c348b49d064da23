import type { ChannelDerived } from "../derive";
import type { ChannelSettings } from "../schema";
import { LONG_PHASE_US, MIN_ELECTRODE_SPACING_CM, SMALL_ELECTRODE_CM2 } from "../thresholds";
import { LIMIT_TOLERANCE } from "../units";
import { fmt } from "./format";
import { DEFER, SOURCES } from "./sources";
import type { Finding } from "./types";

/** Placement rules of thumb: overflow at the hand and wrist, spacing, and unequal electrode sizes. */
export function placementFindings(s: ChannelSettings, d: ChannelDerived): Finding[] {
  const out: Finding[] = [];
  const smallest = d.electrodes.smallestAreaCm2;
  if (s.bodyRegion === "hand-wrist" && s.phaseDurationUs > LONG_PHASE_US && smallest < SMALL_ELECTRODE_CM2) {
    out.push({
      code: "overflow-risk-hand-wrist",
      severity: "warning",
      title: "Long pulses on a small electrode at the hand and wrist",
      explanation:
        `Phases of ${fmt(s.phaseDurationUs)} µs on an electrode of ${fmt(smallest)} cm² around the hand ` +
        "and wrist, where many small muscles lie close together, risk the contraction spilling into " +
        "neighbouring muscles. Check in the clinic that only the intended movement is produced; a shorter " +
        `phase duration may give a more selective contraction. ${DEFER}`,
      source: SOURCES.commonPractice,
      numbers: { phaseDurationUs: s.phaseDurationUs, smallestAreaCm2: smallest },
    });
  }
  const spacing = s.interElectrodeSpacingCm;
  if (spacing !== undefined && spacing < MIN_ELECTRODE_SPACING_CM) {
    out.push({
      code: "electrodes-too-close",
      severity: "warning",
      title: "Electrodes closer than about 3 cm",
      explanation:
        `The electrodes are recorded as ${fmt(spacing)} cm apart. Closer than about 3 cm (three ` +
        "finger-widths), the current tends to flow through the skin between them rather than through the " +
        "muscle, concentrating at the facing edges; they must never touch. Check the placement. " +
        DEFER,
      source: SOURCES.commonPractice,
      numbers: { interElectrodeSpacingCm: spacing },
    });
  }
  const [a, b] = d.electrodes.areasCm2;
  if (a !== undefined && b !== undefined && Math.abs(a - b) > Math.max(a, b) * LIMIT_TOLERANCE) {
    out.push({
      code: "electrode-sizes-differ",
      severity: "note",
      title: "Electrodes of different sizes",
      explanation:
        `The electrodes are ${fmt(a)} cm² and ${fmt(b)} cm². The same current crosses both, so the smaller ` +
        "one carries the higher density and is usually felt more; the density figures here use it. " +
        DEFER,
      source: SOURCES.commonPractice,
      numbers: { firstAreaCm2: a, secondAreaCm2: b },
    });
  }
  return out;
}
