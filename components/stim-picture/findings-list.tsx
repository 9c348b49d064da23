import { Notice } from "@/components/ui/notice";
import { sortFindings, type Finding, type Severity } from "@/lib/stim";

const COUNT_WORDS: Record<Severity, [string, string]> = {
  blocks: ["setting that blocks publishing", "settings that block publishing"],
  warning: ["warning", "warnings"],
  note: ["note", "notes"],
};

/** "1 setting that blocks publishing, 2 notes": the summary read out when the findings change. */
export function findingsSummary(findings: readonly Finding[]): string {
  if (findings.length === 0) return "No findings.";
  const parts = (["blocks", "warning", "note"] as const).flatMap((severity) => {
    const n = findings.filter((f) => f.severity === severity).length;
    return n === 0 ? [] : [`${n} ${COUNT_WORDS[severity][n === 1 ? 0 : 1]}`];
  });
  return `${parts.join(", ")}.`;
}

// Severity is shown three ways (icon, word, colour) by Notice; blocks first, whatever order the caller passes.
export function FindingsList({ findings }: { findings: readonly Finding[] }) {
  const sorted = sortFindings(findings);
  return (
    <div className="flex flex-col gap-3">
      <p role="status" className="font-bold">
        {findingsSummary(sorted)}
      </p>
      <ul className="flex flex-col gap-3" aria-label="Findings">
        {sorted.map((finding, i) => (
          <li key={`${finding.code}-${finding.field ?? i}`}>
            <Notice tone={finding.severity} title={finding.title}>
              <p>{finding.explanation}</p>
              <p className="mt-1 text-sm text-ink-soft">Source: {finding.source}</p>
            </Notice>
          </li>
        ))}
      </ul>
    </div>
  );
}
