import type { ReactNode } from "react";

// One section of a signed screening as a description list; an answer that is missing reads "Not recorded".
export function AnswerRows({ rows }: { rows: [label: string, value: ReactNode][] }) {
  return (
    <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-[minmax(12rem,1fr)_2fr]">
      {rows.map(([label, value]) => (
        <div key={label} className="contents">
          <dt className="font-bold">{label}</dt>
          <dd className="whitespace-pre-line">{value === undefined || value === null || value === "" ? "Not recorded" : value}</dd>
        </div>
      ))}
    </dl>
  );
}

const YES_NO_WORDS: Record<string, string> = { yes: "Yes", no: "No" };

export function yesNoText(value: string | null | undefined): string | undefined {
  return value ? (YES_NO_WORDS[value] ?? value) : undefined;
}

export function optionText(labels: Record<string, string>, value: string | null | undefined): string | undefined {
  return value ? (labels[value] ?? value) : undefined;
}
