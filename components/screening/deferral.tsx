// Said wherever a screening is shown: Rampline keeps the record and enforces the red-flag block; the decisions are
// the treating clinician's.
export function ScreeningDeferral() {
  return (
    <p className="text-sm text-ink-soft">
      Rampline records the screening, the outcome you choose and any clearances, and holds publishing while a red flag
      has no clearance. Whether and how to stimulate is the treating clinician&apos;s decision, following the
      stimulator manufacturer&apos;s instructions, local regulations and professional guidance.
    </p>
  );
}
