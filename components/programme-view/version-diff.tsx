import type { ProgrammeContent } from "@/lib/programmes/content";
import { describeChange, diffProgrammes } from "@/lib/programmes/diff";
import { zoneLabelForMarker } from "@/lib/programmes/zone-names";

// What changed from one version to another, one readable line per change.
export function VersionDiff({ before, after, fromNumber, toNumber }: { before: ProgrammeContent; after: ProgrammeContent; fromNumber: number; toNumber: number }) {
  const lines = diffProgrammes(before, after, zoneLabelForMarker).map(describeChange);
  return (
    <section aria-label={`Changes from version ${fromNumber} to version ${toNumber}`}>
      {lines.length === 0 ? (
        <p className="text-ink-soft">No differences between version {fromNumber} and version {toNumber}.</p>
      ) : (
        <ul className="flex flex-col gap-1">
          {lines.map((line) => (
            <li key={line} className="border-l-4 border-note bg-note-bg px-3 py-2 tabular-nums">
              {line}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
