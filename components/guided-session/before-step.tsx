import Link from "next/link";
import { Button, buttonClasses } from "@/components/ui/button";
import { Checklist } from "./checklist";
import type { ChecklistItem, SessionWords } from "./session-plan";
import { UsualCautions } from "./usual-cautions";

// Step 1: everything ticked before the timer can be reached. The button stays disabled until then, and the line
// beside it says how many are left, so the reason is never a mystery.
export function BeforeStep({
  items,
  ticked,
  ownCautions,
  words,
  onTick,
  onNext,
}: {
  items: ChecklistItem[];
  ticked: readonly string[];
  ownCautions: string[];
  words: SessionWords;
  onTick: (id: string, checked: boolean) => void;
  onNext: () => void;
}) {
  const done = items.filter((item) => ticked.includes(item.id)).length;
  const left = items.length - done;
  return (
    <div className="flex flex-col gap-6">
      <UsualCautions ownCautions={ownCautions} your={words.your} />
      <Checklist legend="Tick each one when it is done" items={items} ticked={ticked} onChange={onTick} />
      <div className="flex flex-col gap-3">
        <p id="before-count" className="font-bold tabular-nums">
          {left === 0 ? `All ${items.length} ticked.` : `${done} of ${items.length} ticked: ${left} still to do.`}
        </p>
        <Button large disabled={left > 0} aria-describedby="before-count" onClick={onNext} className="w-full">
          Start the session timer
        </Button>
        <Link href="/today" className={`${buttonClasses("secondary", true)} w-full no-underline`}>
          Back to Today
        </Link>
      </div>
    </div>
  );
}
