export type Severity = "blocks" | "warning" | "note";

export type FindingCode =
  | "value-out-of-range"
  | "value-invalid"
  | "pulses-overlap"
  | "on-time-zero"
  | "ramps-exceed-on-time"
  | "current-density-high"
  | "power-density-high"
  | "energy-per-pulse-high"
  | "net-charge-not-zero"
  | "overflow-risk-hand-wrist"
  | "electrodes-too-close"
  | "frequency-band"
  | "pulse-duration-band"
  | "short-rest-early"
  | "ramps-longer-than-hold"
  | "electrode-sizes-differ";

export interface Finding {
  /** Stable identifier: safe to store, test and translate against. */
  code: FindingCode;
  severity: Severity;
  title: string;
  /** Plain English a therapist can act on. */
  explanation: string;
  /** The publication and clause, or "Common practice (no published source)". */
  source: string;
  /** The figures the finding rests on, keyed with their unit (e.g. `currentDensityMaPerCm2`). */
  numbers?: Record<string, number>;
  /** For input findings: the field path, as in the parse helper's field errors. */
  field?: string;
}

export const SEVERITY_ORDER: Record<Severity, number> = { blocks: 0, warning: 1, note: 2 };

/** blocks → warning → note; findings of equal severity keep the order they were produced in. */
export function sortFindings(findings: readonly Finding[]): Finding[] {
  return [...findings].sort((a, b) => SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity]);
}
