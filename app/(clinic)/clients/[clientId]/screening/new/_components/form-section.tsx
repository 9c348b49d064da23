import { useId, type ReactNode } from "react";

// One lettered section of the checklist (A–F), named by its heading for assistive technology.
export function FormSection({ title, intro, children }: { title: string; intro?: ReactNode; children: ReactNode }) {
  const id = useId();
  return (
    <section aria-labelledby={id} className="flex flex-col gap-5 rounded-lg border border-line bg-card p-5 shadow-sm">
      <div>
        <h2 id={id} className="text-xl">
          {title}
        </h2>
        {intro ? <div className="mt-1 text-ink-soft">{intro}</div> : null}
      </div>
      {children}
    </section>
  );
}
