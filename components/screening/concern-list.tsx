import { Notice, type NoticeTone } from "@/components/ui/notice";
import { concernText, type Concern, type ConcernLevel } from "@/lib/screening/rules";

const GROUPS: { level: ConcernLevel; tone: NoticeTone; word: string }[] = [
  { level: "do-not-place", tone: "blocks", word: "Do not place electrodes here" },
  { level: "precaution", tone: "warning", word: "Precaution" },
  { level: "note", tone: "note", word: "Note" },
];

// The concerns a screening's answers raise, strongest first, each with why and where the rule comes from.
export function ConcernList({ concerns, empty = "No concerns recorded." }: { concerns: Concern[]; empty?: string }) {
  if (concerns.length === 0) return <p className="text-ink-soft">{empty}</p>;
  return (
    <div className="flex flex-col gap-3">
      {GROUPS.map(({ level, tone, word }) => {
        const items = concerns.filter((concern) => concern.level === level);
        if (items.length === 0) return null;
        return (
          <Notice key={level} tone={tone} word={word}>
            <ul className="flex flex-col gap-2">
              {items.map((concern) => (
                <li key={`${concern.code}-${concern.site?.index ?? "all"}`}>
                  <span className="font-bold">{concernText(concern)}.</span> {concern.detail}
                  <span className="block text-sm text-ink-soft">Source: {concern.source}.</span>
                </li>
              ))}
            </ul>
          </Notice>
        );
      })}
    </div>
  );
}
