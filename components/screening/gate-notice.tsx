import { Notice } from "@/components/ui/notice";
import type { PublishingGate } from "@/lib/screening/gate";

// Whether the screening lets a programme be published, with every reason in words.
export function GateNotice({ gate }: { gate: Pick<PublishingGate, "ok" | "reasons"> }) {
  if (gate.ok) {
    return (
      <Notice tone="ok" word="Screening complete">
        The latest screening does not hold up publishing.
      </Notice>
    );
  }
  return (
    <Notice tone="blocks" title="Screening">
      <ul className="list-disc pl-5">
        {gate.reasons.map((reason) => (
          <li key={reason}>{reason}</li>
        ))}
      </ul>
    </Notice>
  );
}
