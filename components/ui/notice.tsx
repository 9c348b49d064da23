import type { ReactNode } from "react";

export type NoticeTone = "note" | "warning" | "blocks" | "ok";

// Severity is carried by an icon and a word as well as colour, so it survives colour blindness and greyscale print.
const tones: Record<NoticeTone, { word: string; icon: string; classes: string }> = {
  note: { word: "Note", icon: "ℹ", classes: "border-note bg-note-bg text-note" },
  warning: { word: "Warning", icon: "▲", classes: "border-warning bg-warning-bg text-warning" },
  blocks: { word: "Blocks publishing", icon: "■", classes: "border-blocks bg-blocks-bg text-blocks" },
  ok: { word: "Done", icon: "✓", classes: "border-ok bg-ok-bg text-ok" },
};

export function Notice({
  tone,
  title,
  children,
  word,
  role,
}: {
  tone: NoticeTone;
  title?: string;
  children?: ReactNode;
  word?: string;
  role?: "alert" | "status";
}) {
  const t = tones[tone];
  return (
    <div role={role} className={`rounded-md border-l-4 px-4 py-3 ${t.classes}`}>
      <p className="flex items-baseline gap-2 font-bold">
        <span aria-hidden>{t.icon}</span>
        <span>{word ?? t.word}</span>
        {title ? <span className="text-ink">· {title}</span> : null}
      </p>
      {children ? <div className="mt-1 text-ink">{children}</div> : null}
    </div>
  );
}
