import { useRef, type KeyboardEvent } from "react";
import { VIEWS, type View } from "@/lib/placement";
import { VIEW_HINTS, VIEW_TITLES } from "./marker-text";

export const tabId = (idBase: string, view: View) => `${idBase}-tab-${view}`;

/** Front and back as tabs (the ARIA tabs pattern: arrow keys, Home and End move between them and select). */
export function ViewTabs({ view, onSelect, idBase, panelId, tags }: { view: View; onSelect: (view: View) => void; idBase: string; panelId: string; tags: Record<View, string[]> }) {
  const tabs = useRef<Partial<Record<View, HTMLButtonElement | null>>>({});
  const go = (next: View) => {
    onSelect(next);
    tabs.current[next]?.focus();
  };
  const onKeyDown = (event: KeyboardEvent<HTMLButtonElement>) => {
    const at = VIEWS.indexOf(view);
    const next =
      event.key === "ArrowRight" ? VIEWS[(at + 1) % VIEWS.length]
        : event.key === "ArrowLeft" ? VIEWS[(at + VIEWS.length - 1) % VIEWS.length]
          : event.key === "Home" ? VIEWS[0]
            : event.key === "End" ? VIEWS[VIEWS.length - 1]
              : undefined;
    if (!next) return;
    event.preventDefault();
    go(next);
  };
  return (
    <div role="tablist" aria-label="Body outline view" className="flex flex-wrap gap-2">
      {VIEWS.map((v) => (
        <button
          key={v}
          ref={(el) => {
            tabs.current[v] = el;
          }}
          type="button"
          role="tab"
          id={tabId(idBase, v)}
          aria-selected={v === view}
          aria-controls={panelId}
          tabIndex={v === view ? 0 : -1}
          onClick={() => onSelect(v)}
          onKeyDown={onKeyDown}
          className={`min-h-11 rounded-md border-2 px-4 py-1 text-left font-bold ${v === view ? "border-ink bg-ink text-card" : "border-line bg-card text-ink hover:border-ink"}`}
        >
          <span className="block">{VIEW_TITLES[v]}</span>
          <span className="block text-sm font-normal">
            {VIEW_HINTS[v]}
            {/* Which of the edited channel's markers are in this view, so a marker is never lost behind a tab. */}
            {tags[v].length > 0 ? ` · ${tags[v].join(" ")}` : null}
          </span>
        </button>
      ))}
    </div>
  );
}
