import type { ReactNode } from "react";

// One chart as a card: the title (h2), the one-sentence summary, the drawing, its key, and the same figures as a
// table behind a disclosure. The table is always in the page, so screen readers and the browser's find reach it.
export function ChartSection({
  id,
  title,
  summary,
  chart,
  chartKey,
  tableLabel,
  table,
}: {
  id: string;
  title: string;
  summary: string;
  chart: ReactNode;
  chartKey?: ReactNode;
  tableLabel: string;
  table: ReactNode;
}) {
  return (
    <section aria-labelledby={`${id}-title`} className="rounded-lg border border-line bg-card p-5 shadow-sm">
      <h2 id={`${id}-title`} className="text-xl">
        {title}
      </h2>
      <p className="mt-1 text-ink-soft">{summary}</p>
      <div className="mt-4 tabular-nums">{chart}</div>
      {chartKey ? <div className="mt-3">{chartKey}</div> : null}
      <details className="mt-4">
        <summary className="cursor-pointer py-2 font-bold underline underline-offset-4">{tableLabel}</summary>
        <div className="mt-2 overflow-x-auto">{table}</div>
      </details>
    </section>
  );
}
