import type { ReactNode } from "react";

// The box every chart's tooltip is drawn in: ink on the card colour, figures in tabular form.
export function TooltipBox({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="max-w-xs rounded-md border border-ink bg-card px-3 py-2 text-sm text-ink tabular-nums shadow-md">
      <p className="font-bold">{title}</p>
      <div className="mt-1 flex flex-col gap-0.5">{children}</div>
    </div>
  );
}

/** What a chart's tooltip function reads from recharts: whether it is showing, and the data row under the pointer. */
export type TooltipArgs = { active?: boolean; payload?: ReadonlyArray<{ payload?: unknown }> };

export function activeRow<T>(args: TooltipArgs): T | undefined {
  return args.active ? (args.payload?.[0]?.payload as T | undefined) : undefined;
}
