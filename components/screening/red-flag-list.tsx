import type { ReactNode } from "react";
import { Notice } from "@/components/ui/notice";
import type { RedFlagView } from "@/lib/screening/summary";
import { formatMoment } from "./format";

// A screening's systemic red flags, each either blocking publishing or cleared by a named clinician. `action` lets
// a page put the clearance form under a flag that still needs one.
export function RedFlagList({ flags, action }: { flags: RedFlagView[]; action?: (flag: RedFlagView) => ReactNode }) {
  if (flags.length === 0) return <p className="text-ink-soft">No systemic red flags recorded.</p>;
  return (
    <ul className="flex flex-col gap-3" aria-label="Systemic red flags">
      {flags.map((flag) => (
        <li key={flag.id} className="flex flex-col gap-3">
          {flag.clearance ? (
            <Notice tone="ok" word="Cleared" title={flag.label}>
              Cleared by {flag.clearance.clinicianName}; recorded by {flag.clearance.recordedByName} on{" "}
              {formatMoment(flag.clearance.recordedAt)}.
              <span className="mt-1 block whitespace-pre-line">{flag.clearance.note}</span>
            </Notice>
          ) : (
            <Notice tone="blocks" title={flag.label}>
              Needs a named clinician&apos;s clearance before a programme can be published.
            </Notice>
          )}
          {!flag.clearance && action ? action(flag) : null}
        </li>
      ))}
    </ul>
  );
}
