import { Notice } from "@/components/ui/notice";
import { PLACEMENT_DEFER, sortPlacementFindings, type PlacementFinding } from "@/lib/placement";

const COUNT_WORDS = {
  blocks: ["finding that blocks publishing", "findings that block publishing"],
  warning: ["warning", "warnings"],
  note: ["note", "notes"],
} as const;

/** "Channel 1: 1 finding that blocks publishing, 1 warning." */
export function placementSummary(channelLabel: string, findings: readonly PlacementFinding[]): string {
  if (findings.length === 0) return `${channelLabel}: nothing to check in the placement.`;
  const parts = (["blocks", "warning", "note"] as const).flatMap((severity) => {
    const n = findings.filter((f) => f.severity === severity).length;
    return n === 0 ? [] : [`${n} ${COUNT_WORDS[severity][n === 1 ? 0 : 1]}`];
  });
  return `${channelLabel}: ${parts.join(", ")}.`;
}

// Severity is shown three ways by Notice (icon, word, colour), blocks first.
export function PlacementNotices({ channelLabel, findings }: { channelLabel: string; findings: readonly PlacementFinding[] }) {
  const sorted = sortPlacementFindings(findings);
  return (
    <div className="flex flex-col gap-3">
      <p role="status" className="font-bold">
        {placementSummary(channelLabel, sorted)}
      </p>
      {sorted.length > 0 ? (
        <ul className="flex flex-col gap-3" aria-label={`Placement findings for ${channelLabel}`}>
          {sorted.map((finding) => (
            <li key={finding.code}>
              <Notice tone={finding.severity} title={finding.title}>
                <p>{finding.explanation}</p>
                <p className="mt-1 text-sm text-ink-soft">Source: {finding.source}</p>
              </Notice>
            </li>
          ))}
        </ul>
      ) : null}
      <p className="text-sm text-ink-soft">
        These checks point out common problems with where electrodes are drawn; they are not a clinical decision.{" "}
        {PLACEMENT_DEFER}
      </p>
    </div>
  );
}
