import Link from "next/link";
import { buttonClasses } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { Checklist } from "./checklist";
import type { ChecklistItem, SessionWords } from "./session-plan";

// Step 3: how the session went, the skin check, the electrode care, and the way on to the session log. The care
// list is there to follow, not a gate: nothing stops the person logging the session.
export function AfterStep({
  minutesDone,
  minutesPerSession,
  items,
  ticked,
  words,
  onTick,
  onLeave,
}: {
  minutesDone: number;
  minutesPerSession: number;
  items: ChecklistItem[];
  ticked: readonly string[];
  words: SessionWords;
  onTick: (id: string, checked: boolean) => void;
  onLeave: () => void;
}) {
  const full = minutesDone >= minutesPerSession;
  const minutes = `${minutesDone} ${minutesDone === 1 ? "minute" : "minutes"}`;
  return (
    <div className="flex flex-col gap-6">
      {full ? (
        <Notice tone="ok" word="Done" title={`The ${minutesPerSession} minutes are over`}>
          Turn the stimulator off now if it has not stopped by itself.
        </Notice>
      ) : (
        <Notice tone="note" word="Stopped" title={`Stopped after ${minutes} of ${minutesPerSession}`}>
          Turn the stimulator off if it is still running.
        </Notice>
      )}
      <section aria-labelledby="skin-check" className="flex flex-col gap-2 rounded-lg border-2 border-ink bg-card p-5">
        <h3 id="skin-check" className="text-2xl">
          Look at the skin under each electrode now
        </h3>
        <p>
          A little pinkness that fades soon afterwards is usual. If there is a blister, broken skin or a burn mark, do
          not use that place again and contact {words.your} clinic. If you are not sure, ask {words.your} therapist.
        </p>
      </section>
      <Checklist legend="Looking after the electrodes" items={items} ticked={ticked} onChange={onTick} />
      <div className="flex flex-col gap-3">
        <Link href={`/check-in?minutes=${minutesDone}`} onClick={onLeave} className={`${buttonClasses("primary", true)} w-full no-underline`}>
          Log this session
        </Link>
        <p className="text-base text-ink-soft">
          The log records the {minutes} done and how the session and the skin were.
        </p>
        <Link href="/today" onClick={onLeave} className={`${buttonClasses("secondary", true)} w-full no-underline`}>
          Not now
        </Link>
      </div>
    </div>
  );
}
