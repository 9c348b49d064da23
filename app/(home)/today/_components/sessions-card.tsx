import Link from "next/link";
import { buttonClasses } from "@/components/ui/button";
import { Card } from "@/components/ui/card";

// Today's sessions from the schedule in force: how many are planned, done and left.
export function SessionsCard({ planned, done, minutes }: { planned: number; done: number; minutes: number }) {
  const left = Math.max(planned - done, 0);
  return (
    <Card title="Today's sessions">
      <p className="text-2xl font-bold tabular-nums" aria-live="polite">
        {done} of {planned} done
      </p>
      <p className="mt-1 text-ink-soft">
        {left === 0 ? "That is all for today. Well done." : `${left} left today, ${minutes} minutes each.`}
      </p>
      <div className="mt-4 flex flex-col gap-3 sm:flex-row">
        <Link href="/session" className={buttonClasses("primary", true)}>
          Start a guided session
        </Link>
        <Link href="/check-in" className={buttonClasses("secondary", true)}>
          Log a session
        </Link>
      </div>
    </Card>
  );
}
