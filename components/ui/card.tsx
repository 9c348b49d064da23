import type { ReactNode } from "react";

export function Card({ title, children, actions }: { title?: string; children: ReactNode; actions?: ReactNode }) {
  return (
    <section className="rounded-lg border border-line bg-card p-5 shadow-sm">
      {title || actions ? (
        <div className="mb-3 flex flex-wrap items-center justify-between gap-3">
          {title ? <h2 className="text-xl">{title}</h2> : <span />}
          {actions}
        </div>
      ) : null}
      {children}
    </section>
  );
}

export function EmptyState({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="rounded-lg border-2 border-dashed border-line p-6 text-center">
      <p className="text-lg font-bold">{title}</p>
      <div className="mt-2 text-ink-soft">{children}</div>
    </div>
  );
}
