import Link from "next/link";
import type { ChecklistItem } from "./session-plan";

// A checklist of large rows: the whole row is the target (well over 48 px tall), the box itself is big enough to
// see, and a tick is shown by the box's own tick and the words "Done" for screen readers, not by colour.
export function Checklist({
  legend,
  items,
  ticked,
  onChange,
}: {
  legend: string;
  items: ChecklistItem[];
  ticked: readonly string[];
  onChange: (id: string, checked: boolean) => void;
}) {
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-2 text-xl font-bold">{legend}</legend>
      {items.map((item) => {
        const inputId = `check-${item.id}`;
        return (
          <div key={item.id} className="rounded-lg border-2 border-line bg-card has-[:checked]:border-ink has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-focus">
            <label htmlFor={inputId} className="flex min-h-16 cursor-pointer items-start gap-4 p-4">
              <input
                id={inputId}
                type="checkbox"
                checked={ticked.includes(item.id)}
                onChange={(event) => onChange(item.id, event.target.checked)}
                className="mt-0.5 size-8 shrink-0 cursor-pointer accent-ink focus-visible:outline-none"
              />
              <span>{item.text}</span>
            </label>
            {item.link ? (
              <p className="-mt-2 px-4 pb-4 pl-16">
                <Link href={item.link.href} className="inline-flex min-h-12 items-center font-bold">
                  {item.link.text}
                </Link>
              </p>
            ) : null}
          </div>
        );
      })}
    </fieldset>
  );
}
