// Pure geometry of one pulse period: microseconds and milliamperes in, SVG coordinates out.

export type PulsePhase = { currentMa: number; durationUs: number };
export type PulseInput = { phases: readonly PulsePhase[]; interphaseGapUs: number; periodUs: number };

export type PulsePartKind = "phase" | "interphase-gap" | "to-next-pulse";

export interface PulsePart {
  kind: PulsePartKind;
  /** 0-based phase number, for phases. */
  phase?: number;
  startUs: number;
  durationUs: number;
  /** Signed; 0 for the gaps. */
  currentMa: number;
  x0: number;
  x1: number;
}

export interface PulseGeometry {
  parts: PulsePart[];
  /** Phases plus interphase gap, µs. */
  pulseWidthUs: number;
  /** The pulse fills or overruns the period, so the next pulse would start inside this one. */
  overlap: boolean;
  /** The pulse is drawn wider than scale and the rest of the period shortened; `breakX` marks the break. */
  broken: boolean;
  breakX: number | null;
  /** Where the next pulse starts (the end of the period). */
  periodX: number;
}

export type PulseLayout = {
  x0: number;
  x1: number;
  /** Above this period-to-pulse ratio the rest of the period is shortened behind an axis break. */
  breakRatio: number;
  /** Share of the plot the pulse takes when the axis is broken. */
  pulseShare: number;
};

export const DEFAULT_PULSE_LAYOUT: PulseLayout = { x0: 80, x1: 620, breakRatio: 4, pulseShare: 0.55 };

/** The pulse's parts in time order: phase 1, the interphase gap (biphasic, when set), phase 2. */
function pulseParts(input: PulseInput): Array<Omit<PulsePart, "x0" | "x1">> {
  const out: Array<Omit<PulsePart, "x0" | "x1">> = [];
  let startUs = 0;
  input.phases.forEach((p, phase) => {
    if (phase > 0 && input.interphaseGapUs > 0) {
      out.push({ kind: "interphase-gap", startUs, durationUs: input.interphaseGapUs, currentMa: 0 });
      startUs += input.interphaseGapUs;
    }
    out.push({ kind: "phase", phase, startUs, durationUs: p.durationUs, currentMa: p.currentMa });
    startUs += p.durationUs;
  });
  return out;
}

export function pulseGeometry(input: PulseInput, layout: PulseLayout = DEFAULT_PULSE_LAYOUT): PulseGeometry {
  const pulse = pulseParts(input);
  const pulseWidthUs = pulse.reduce((sum, p) => sum + p.durationUs, 0);
  const { periodUs } = input;
  const span = layout.x1 - layout.x0;
  const overlap = pulseWidthUs >= periodUs * (1 - 1e-9);
  const broken = !overlap && periodUs > layout.breakRatio * pulseWidthUs;
  // To scale, the drawing spans the period (or the whole pulse when it overruns the period); broken, the pulse
  // gets a fixed share of the width and the rest of the period takes what is left.
  const pulseSpanX = broken ? span * layout.pulseShare : (span * pulseWidthUs) / Math.max(periodUs, pulseWidthUs);
  const xAt = (us: number) => layout.x0 + (pulseWidthUs > 0 ? (us / pulseWidthUs) * pulseSpanX : 0);
  const parts: PulsePart[] = pulse.map((p) => ({ ...p, x0: xAt(p.startUs), x1: xAt(p.startUs + p.durationUs) }));
  const pulseEndX = layout.x0 + pulseSpanX;
  if (!overlap) {
    parts.push({ kind: "to-next-pulse", startUs: pulseWidthUs, durationUs: periodUs - pulseWidthUs, currentMa: 0, x0: pulseEndX, x1: layout.x1 });
  }
  return {
    parts,
    pulseWidthUs,
    overlap,
    broken,
    breakX: broken ? (pulseEndX + layout.x1) / 2 : null,
    periodX: overlap ? xAt(periodUs) : layout.x1,
  };
}

/** Vertical scale: the largest phase reaches `height` above or below the baseline; the sign gives the side. */
export function currentToY(currentMa: number, maxAbsMa: number, baseY: number, height: number): number {
  return maxAbsMa > 0 ? baseY - (currentMa / maxAbsMa) * height : baseY;
}
